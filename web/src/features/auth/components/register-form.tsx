import { Field, Input } from '@fluentui/react-components';
import { PASSWORD_MIN_LENGTH, registerRequestSchema, type AuthResponse } from '@homeground/shared';
import { useRegisterMutation } from '../../../api/auth/auth.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { describeAuthFailure } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';

/** Name, e-mail and password, checked with the shared schema; a taken e-mail shows beside its field. */
export function RegisterForm({ onRegistered }: { onRegistered: (auth: AuthResponse) => void }) {
  const styles = useAuthFormStyles();
  const registerAccount = useRegisterMutation();
  const form = useSchemaForm({ schema: registerRequestSchema, initial: { displayName: '', email: '', password: '' } });

  const submit = form.handleSubmit((body) =>
    registerAccount.mutate(body, {
      onSuccess: onRegistered,
      onError: (error) => form.fail(error, (e, fields) => describeAuthFailure(e, 'register', fields)),
    }),
  );

  return (
    <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-label="Create an account">
      <FormFailure message={form.failure} />
      <Field label="Your name" hint="Your group sees this name." required {...form.validation('displayName')}>
        <Input
          name="displayName"
          autoComplete="name"
          value={form.values.displayName}
          onChange={(_, d) => form.change('displayName', d.value)}
        />
      </Field>
      <Field label="E-mail" required {...form.validation('email')}>
        <Input
          type="email"
          name="email"
          autoComplete="email"
          value={form.values.email}
          onChange={(_, d) => form.change('email', d.value)}
        />
      </Field>
      <Field
        label="Password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A short sentence is easy to remember.`}
        required
        {...form.validation('password')}
      >
        <Input
          type="password"
          name="password"
          autoComplete="new-password"
          value={form.values.password}
          onChange={(_, d) => form.change('password', d.value)}
        />
      </Field>
      <div className={styles.actions}>
        <SubmitButton
          isPending={registerAccount.isPending}
          label="Create account"
          pendingLabel="Creating your account…"
        />
      </div>
    </form>
  );
}
