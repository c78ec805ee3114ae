import { Button, Field, Input, makeStyles, Select, tokens } from '@fluentui/react-components';
import { GROUP_ROLES, type GroupRole, INVITATION_DAYS, inviteRequestSchema } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { useState } from 'react';
import { useInviteMutation } from '../../../api/groups/groups.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalM, maxWidth: '480px' },
  sent: { margin: 0, color: tokens.colorPaletteGreenForeground1 },
  failure: { margin: 0, color: tokens.colorPaletteRedForeground1 },
});

/** An organiser invites someone by e-mail; the message carries a link that makes or joins an account. */
export function InviteForm({ slug, groupName }: { slug: string; groupName: string }) {
  const styles = useStyles();
  const { t } = useTranslation('groups');
  const words = useWords();
  const inviteMutation = useInviteMutation(slug);
  const form = useSchemaForm({ schema: inviteRequestSchema, initial: { email: '', role: 'grower' } });
  const [sentTo, setSentTo] = useState<string | null>(null);

  const submit = form.handleSubmit((body) => {
    setSentTo(null);
    inviteMutation.mutate(body, {
      onSuccess: (invitation) => {
        setSentTo(invitation.email);
        form.change('email', '');
      },
      onError: (error) => form.fail(error),
    });
  });

  return (
    <form
      ref={form.formRef}
      className={styles.form}
      onSubmit={submit}
      noValidate
      aria-label={t('invite.label', { group: groupName })}
    >
      {form.failure ? (
        <p className={styles.failure} role="alert">
          {form.failure}
        </p>
      ) : null}
      <Field label={t('invite.email')} required {...form.validation('email')}>
        <Input
          type="email"
          name="email"
          autoComplete="off"
          value={form.values.email}
          onChange={(_, d) => form.change('email', d.value)}
        />
      </Field>
      <Field
        label={t('invite.role')}
        hint={words.groupRole[form.values.role as GroupRole]?.does}
        {...form.validation('role')}
      >
        <Select name="role" value={form.values.role} onChange={(_, d) => form.change('role', d.value)}>
          {GROUP_ROLES.map((r) => (
            <option key={r} value={r}>
              {words.groupRole[r].title}
            </option>
          ))}
        </Select>
      </Field>
      <div>
        <Button type="submit" appearance="primary" disabled={inviteMutation.isPending}>
          {inviteMutation.isPending ? t('invite.sending') : t('invite.send')}
        </Button>
      </div>
      <p aria-live="polite" className={styles.sent}>
        {sentTo ? t('invite.sent', { email: sentTo, days: INVITATION_DAYS }) : ''}
      </p>
    </form>
  );
}
