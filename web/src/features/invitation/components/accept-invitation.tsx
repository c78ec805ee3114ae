import { Button, makeStyles, tokens } from '@fluentui/react-components';
import {
  acceptInvitationRequestSchema,
  type AuthResponse,
  type InvitationPreview,
  type User,
} from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { invitationPreviewQueryOptions } from '../../../api/invitations/invitations.queries.js';
import { useAcceptInvitationMutation } from '../../../api/invitations/invitations.mutations.js';
import { RouterButton } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { ErrorState, QueryState } from '../../../components/states/index.js';
import { paths } from '../../../config/paths.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { SchemaTextField, useNewPasswordHint } from '../../../components/forms/schema-text-field.js';

const useStyles = makeStyles({
  card: { maxWidth: '560px', display: 'grid', gap: tokens.spacingVerticalM },
  form: { display: 'grid', gap: tokens.spacingVerticalM },
  lead: { margin: 0 },
  failure: { margin: 0, color: tokens.colorPaletteRedForeground1 },
});

/** A new account needs both; the shared schema leaves them optional because an account holder sends none. */
const newAccountSchema = acceptInvitationRequestSchema.required();

export interface AcceptInvitationProps {
  token: string;
  /** The signed-in person, or null. */
  user: User | null;
  /** Keeps the sign-in the accepted invitation answers with, then moves on. */
  onJoined: (auth: AuthResponse) => void;
}

/** The page an invitation link opens: what the group is, and one step to join it. */
export function AcceptInvitation({ token, user, onJoined }: AcceptInvitationProps) {
  const preview = useQuery(invitationPreviewQueryOptions(token));
  const { t } = useTranslation('groups');
  return (
    <QueryState
      query={preview}
      loading={t('invitation.loading')}
      error={(error) => <ErrorState title={t('invitation.cannotUse')} message={error.message} />}
    >
      {(p) => <Invitation preview={p} token={token} user={user} onJoined={onJoined} />}
    </QueryState>
  );
}

function Invitation({ preview, token, user, onJoined }: AcceptInvitationProps & { preview: InvitationPreview }) {
  const styles = useStyles();
  const { t } = useTranslation('groups');
  const role = useWords().groupRole[preview.role];
  const accept = useAcceptInvitationMutation(token);
  const here = paths.invitation.build(token);
  return (
    <>
      <PageIntro title={t('invitation.title', { group: preview.groupName })}>
        {t('invitation.invited', {
          group: preview.groupName,
          town: preview.town,
          state: preview.state,
          role: t(`invitation.roleWithArticle.${preview.role}`),
          does: role.does.charAt(0).toLowerCase() + role.does.slice(1),
        })}
      </PageIntro>
      <ContentCard className={styles.card} aria-label={t('invitation.accept')}>
        {user && user.email.toLowerCase() === preview.email ? (
          <>
            <p className={styles.lead}>{t('invitation.signedInAs', { email: user.email })}</p>
            {accept.isError ? (
              <p className={styles.failure} role="alert">
                {accept.error.message}
              </p>
            ) : null}
            <div>
              <Button
                appearance="primary"
                disabled={accept.isPending}
                onClick={() => accept.mutate({}, { onSuccess: onJoined })}
              >
                {t('invitation.join', { group: preview.groupName })}
              </Button>
            </div>
          </>
        ) : user ? (
          <p className={styles.lead}>{t('invitation.otherAccount', { invited: preview.email, email: user.email })}</p>
        ) : preview.accountExists ? (
          <>
            <p className={styles.lead}>{t('invitation.hasAccount', { email: preview.email })}</p>
            <div>
              <RouterButton appearance="primary" to={paths.signIn.build(here)}>
                {t('invitation.signInToJoin')}
              </RouterButton>
            </div>
          </>
        ) : (
          <NewAccountForm email={preview.email} groupName={preview.groupName} accept={accept} onJoined={onJoined} />
        )}
      </ContentCard>
    </>
  );
}

function NewAccountForm({
  email,
  groupName,
  accept,
  onJoined,
}: {
  email: string;
  groupName: string;
  accept: ReturnType<typeof useAcceptInvitationMutation>;
  onJoined: (auth: AuthResponse) => void;
}) {
  const styles = useStyles();
  const newPasswordHint = useNewPasswordHint();
  const { t } = useTranslation('groups');
  const form = useSchemaForm({ schema: newAccountSchema, initial: { displayName: '', password: '' } });
  const submit = form.handleSubmit((body) =>
    accept.mutate(body, { onSuccess: onJoined, onError: (error) => form.fail(error) }),
  );
  return (
    <form
      ref={form.formRef}
      className={styles.form}
      onSubmit={submit}
      noValidate
      aria-label={t('invitation.makeAccountLabel', { group: groupName })}
    >
      <p className={styles.lead}>{t('invitation.accountUses', { email })}</p>
      {form.failure ? (
        <p className={styles.failure} role="alert">
          {form.failure}
        </p>
      ) : null}
      <SchemaTextField form={form} name="displayName" label={t('invitation.yourName')} required autoComplete="name" />
      <SchemaTextField
        form={form}
        name="password"
        label={t('invitation.password')}
        hint={newPasswordHint}
        required
        type="password"
        autoComplete="new-password"
      />
      <div>
        <Button type="submit" appearance="primary" disabled={accept.isPending}>
          {accept.isPending ? t('invitation.joining') : t('invitation.makeAndJoin')}
        </Button>
      </div>
    </form>
  );
}
