import { useTranslation } from 'react-i18next';
import { registerRequestSchema, type AuthResponse } from '@homeground/shared';
import { useRegisterMutation } from '../../../api/auth/auth.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { describeAuthFailure } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';
import { SchemaTextField, useNewPasswordHint } from '../../../components/forms/schema-text-field.js';

/** Name, e-mail and password, checked with the shared schema; a taken e-mail shows beside its field. */
export function RegisterForm({ onRegistered }: { onRegistered: (auth: AuthResponse) => void }) {
  const styles = useAuthFormStyles();
  const { t } = useTranslation('forms');
  const newPasswordHint = useNewPasswordHint();
  const registerAccount = useRegisterMutation();
  const form = useSchemaForm({ schema: registerRequestSchema, initial: { displayName: '', email: '', password: '' } });

  const submit = form.handleSubmit((body) =>
    registerAccount.mutate(body, {
      onSuccess: onRegistered,
      onError: (error) => form.fail(error, (e, fields) => describeAuthFailure(e, 'register', fields)),
    }),
  );

  return (
    <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-label={t('register.title')}>
      <FormFailure message={form.failure} />
      <SchemaTextField
        form={form}
        name="displayName"
        label={t('fields.name')}
        hint={t('fields.nameHint')}
        required
        autoComplete="name"
      />
      <SchemaTextField form={form} name="email" label={t('fields.email')} required type="email" autoComplete="email" />
      <SchemaTextField
        form={form}
        name="password"
        label={t('fields.password')}
        hint={newPasswordHint}
        required
        type="password"
        autoComplete="new-password"
      />
      <div className={styles.actions}>
        <SubmitButton
          isPending={registerAccount.isPending}
          label={t('register.submit')}
          pendingLabel={t('register.pending')}
        />
      </div>
    </form>
  );
}
