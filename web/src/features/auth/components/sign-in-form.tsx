import { Field, Input } from '@fluentui/react-components';
import { loginRequestSchema, type AuthResponse } from '@homeground/shared';
import { useState, type FormEvent } from 'react';
import { useLoginMutation } from '../../../api/auth/auth.mutations.js';
import { useFocusFirstInvalid } from '../hooks/use-focus-first-invalid.js';
import { describeAuthFailure, fieldErrorsFromZod, type FieldErrors } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';

type SignInField = 'email' | 'password';
const FIELDS: readonly SignInField[] = ['email', 'password'];

/** E-mail and password, checked with the shared schema before anything is sent. */
export function SignInForm({ onSignedIn }: { onSignedIn: (auth: AuthResponse) => void }) {
  const styles = useAuthFormStyles();
  const login = useLoginMutation();
  const { formRef, focusFirstInvalid } = useFocusFirstInvalid<HTMLFormElement>();
  const [values, setValues] = useState<Record<SignInField, string>>({ email: '', password: '' });
  const [errors, setErrors] = useState<FieldErrors<SignInField>>({});
  const [failure, setFailure] = useState<string | null>(null);

  const change = (field: SignInField, value: string) => {
    setValues((v) => ({ ...v, [field]: value }));
    setErrors((e) => ({ ...e, [field]: undefined }));
  };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setFailure(null);
    const parsed = loginRequestSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrorsFromZod<SignInField>(parsed.error));
      focusFirstInvalid();
      return;
    }
    setErrors({});
    login.mutate(parsed.data, {
      onSuccess: onSignedIn,
      onError: (error) => {
        const described = describeAuthFailure(error, 'sign-in', FIELDS);
        setErrors(described.fields);
        setFailure(described.message);
        focusFirstInvalid();
      },
    });
  };

  return (
    <form ref={formRef} className={styles.form} onSubmit={submit} noValidate aria-label="Sign in">
      <FormFailure message={failure} />
      <Field label="E-mail" required validationMessage={errors.email} validationState={errors.email ? 'error' : 'none'}>
        <Input type="email" name="email" autoComplete="email" value={values.email} onChange={(_, d) => change('email', d.value)} />
      </Field>
      <Field label="Password" required validationMessage={errors.password} validationState={errors.password ? 'error' : 'none'}>
        <Input
          type="password"
          name="password"
          autoComplete="current-password"
          value={values.password}
          onChange={(_, d) => change('password', d.value)}
        />
      </Field>
      <div className={styles.actions}>
        <SubmitButton isPending={login.isPending} label="Sign in" pendingLabel="Signing in…" />
      </div>
    </form>
  );
}
