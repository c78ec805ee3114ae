import { useTranslation } from 'react-i18next';
import { loginRequestSchema, type AuthResponse } from '@homeground/shared';
import { useLoginMutation } from '../../../api/auth/auth.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { describeAuthFailure } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';
import { SchemaTextField } from '../../../components/forms/schema-text-field.js';

/** E-mail and password, checked with the shared schema before anything is sent. */
export function SignInForm({ onSignedIn }: { onSignedIn: (auth: AuthResponse) => void }) {
  const styles = useAuthFormStyles();
  const { t } = useTranslation('forms');
  const login = useLoginMutation();
  const form = useSchemaForm({ schema: loginRequestSchema, initial: { email: '', password: '' } });

  const submit = form.handleSubmit((body) =>
    login.mutate(body, {
      onSuccess: onSignedIn,
      onError: (error) => form.fail(error, (e, fields) => describeAuthFailure(e, 'sign-in', fields)),
    }),
  );

  return (
    <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-label={t('signIn.title')}>
      <FormFailure message={form.failure} />
      <SchemaTextField form={form} name="email" label={t('fields.email')} required type="email" autoComplete="email" />
      <SchemaTextField
        form={form}
        name="password"
        label={t('fields.password')}
        required
        type="password"
        autoComplete="current-password"
      />
      <div className={styles.actions}>
        <SubmitButton isPending={login.isPending} label={t('signIn.submit')} pendingLabel={t('signIn.pending')} />
      </div>
    </form>
  );
}
