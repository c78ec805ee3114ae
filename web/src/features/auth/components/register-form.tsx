import { Field, Input } from '@fluentui/react-components';
import { PASSWORD_MIN_LENGTH, registerRequestSchema, type AuthResponse } from '@homeground/shared';
import { useState, type FormEvent } from 'react';
import { useRegisterMutation } from '../../../api/auth/auth.mutations.js';
import { useFocusFirstInvalid } from '../hooks/use-focus-first-invalid.js';
import { describeAuthFailure, fieldErrorsFromZod, type FieldErrors } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';

type RegisterField = 'displayName' | 'email' | 'password';
const FIELDS: readonly RegisterField[] = ['displayName', 'email', 'password'];

/** Name, e-mail and password, checked with the shared schema; a taken e-mail shows beside its field. */
export function RegisterForm({ onRegistered }: { onRegistered: (auth: AuthResponse) => void }) {
  const styles = useAuthFormStyles();
  const registerAccount = useRegisterMutation();
  const { formRef, focusFirstInvalid } = useFocusFirstInvalid<HTMLFormElement>();
  const [values, setValues] = useState<Record<RegisterField, string>>({ displayName: '', email: '', password: '' });
  const [errors, setErrors] = useState<FieldErrors<RegisterField>>({});
  const [failure, setFailure] = useState<string | null>(null);

  const change = (field: RegisterField, value: string) => {
    setValues((v) => ({ ...v, [field]: value }));
    setErrors((e) => ({ ...e, [field]: undefined }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFailure(null);
    const parsed = registerRequestSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrorsFromZod<RegisterField>(parsed.error));
      focusFirstInvalid();
      return;
    }
    setErrors({});
    registerAccount.mutate(parsed.data, {
      onSuccess: onRegistered,
      onError: (error) => {
        const described = describeAuthFailure(error, 'register', FIELDS);
        setErrors(described.fields);
        setFailure(described.message);
        focusFirstInvalid();
      },
    });
  };

  const state = (field: RegisterField) => (errors[field] ? 'error' : 'none');
  return (
    <form ref={formRef} className={styles.form} onSubmit={submit} noValidate aria-label="Create an account">
      <FormFailure message={failure} />
      <Field label="Your name" hint="Your group sees this name." required validationMessage={errors.displayName} validationState={state('displayName')}>
        <Input name="displayName" autoComplete="name" value={values.displayName} onChange={(_, d) => change('displayName', d.value)} />
      </Field>
      <Field label="E-mail" required validationMessage={errors.email} validationState={state('email')}>
        <Input type="email" name="email" autoComplete="email" value={values.email} onChange={(_, d) => change('email', d.value)} />
      </Field>
      <Field
        label="Password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters. A short sentence is easy to remember.`}
        required
        validationMessage={errors.password}
        validationState={state('password')}
      >
        <Input
          type="password"
          name="password"
          autoComplete="new-password"
          value={values.password}
          onChange={(_, d) => change('password', d.value)}
        />
      </Field>
      <div className={styles.actions}>
        <SubmitButton isPending={registerAccount.isPending} label="Create account" pendingLabel="Creating your account…" />
      </div>
    </form>
  );
}
