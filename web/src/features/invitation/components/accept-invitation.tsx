import { Button, makeStyles, tokens } from '@fluentui/react-components';
import {
  acceptInvitationRequestSchema,
  type AuthResponse,
  GROUP_ROLE_WORDS,
  type InvitationPreview,
  type User,
} from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
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

/** "a grower", "an organiser". */
const withArticle = (title: string) => `${/^[aeiou]/i.test(title) ? 'an' : 'a'} ${title.toLowerCase()}`;

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
  return (
    <QueryState
      query={preview}
      loading="Opening your invitation"
      error={(error) => <ErrorState title="This invitation cannot be used." message={error.message} />}
    >
      {(p) => <Invitation preview={p} token={token} user={user} onJoined={onJoined} />}
    </QueryState>
  );
}

function Invitation({ preview, token, user, onJoined }: AcceptInvitationProps & { preview: InvitationPreview }) {
  const styles = useStyles();
  const role = GROUP_ROLE_WORDS[preview.role];
  const accept = useAcceptInvitationMutation(token);
  const here = paths.invitation.build(token);
  return (
    <>
      <PageIntro title={`Join ${preview.groupName}`}>
        You are invited to join {preview.groupName} in {preview.town}, {preview.state} as {withArticle(role.title)}.
        What {withArticle(role.title)} does: {role.does.charAt(0).toLowerCase() + role.does.slice(1)}
      </PageIntro>
      <ContentCard className={styles.card} aria-label="Accept the invitation">
        {user && user.email.toLowerCase() === preview.email ? (
          <>
            <p className={styles.lead}>You are signed in as {user.email}.</p>
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
                Join {preview.groupName}
              </Button>
            </div>
          </>
        ) : user ? (
          <p className={styles.lead}>
            This invitation was sent to {preview.email}, but you are signed in as {user.email}. Sign out, then open the
            link again and sign in with {preview.email}.
          </p>
        ) : preview.accountExists ? (
          <>
            <p className={styles.lead}>
              You already have an account with {preview.email}. Sign in, and you come straight back here.
            </p>
            <div>
              <RouterButton appearance="primary" to={paths.signIn.build(here)}>
                Sign in to join
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
      aria-label={`Make your account and join ${groupName}`}
    >
      <p className={styles.lead}>Your account will use {email}. Choose the name your group sees and a password.</p>
      {form.failure ? (
        <p className={styles.failure} role="alert">
          {form.failure}
        </p>
      ) : null}
      <SchemaTextField form={form} name="displayName" label="Your name" required autoComplete="name" />
      <SchemaTextField
        form={form}
        name="password"
        label="Password"
        hint={newPasswordHint}
        required
        type="password"
        autoComplete="new-password"
      />
      <div>
        <Button type="submit" appearance="primary" disabled={accept.isPending}>
          {accept.isPending ? 'Joining…' : `Make my account and join`}
        </Button>
      </div>
    </form>
  );
}
