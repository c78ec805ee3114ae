import { FluentProvider, Field, Input } from '@fluentui/react-components';
import { loginRequestSchema, type LoginRequest } from '@homeground/shared';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { homegroundTheme } from '../../theme/index.js';
import { ApiRequestError } from '../api-request-error.js';
import { failureFromApi } from './field-errors.js';
import { useSchemaForm } from './use-schema-form.js';

// Expected words: the shared login schema (shared/src/types/auth.ts), which the API's
// validation pipe applies to the same body, and the API's one error shape (DEVELOPERS.md).

function LoginForm({ onValid, apiError }: { onValid: (body: LoginRequest) => void; apiError?: unknown }) {
  const form = useSchemaForm({ schema: loginRequestSchema, initial: { email: '', password: '' } });
  const submit = form.handleSubmit((body) => (apiError ? form.fail(apiError) : onValid(body)));
  return (
    <FluentProvider theme={homegroundTheme}>
      <form ref={form.formRef} onSubmit={submit} noValidate aria-label="Sign in">
        {form.failure ? <p role="alert">{form.failure}</p> : null}
        <Field label="E-mail" {...form.validation('email')}>
          <Input value={form.values.email} onChange={(_, d) => form.change('email', d.value)} />
        </Field>
        <Field label="Password" {...form.validation('password')}>
          <Input type="password" value={form.values.password} onChange={(_, d) => form.change('password', d.value)} />
        </Field>
        <button type="submit">Sign in</button>
      </form>
    </FluentProvider>
  );
}

const badRequest = (fields: { field: string; message: string }[]) =>
  new ApiRequestError({ statusCode: 400, error: 'Bad Request', message: 'Some fields are not right', fields });

describe('useSchemaForm', () => {
  it('checks with the shared schema, says each problem beside its field and focuses the first', async () => {
    const onValid = vi.fn();
    render(<LoginForm onValid={onValid} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'mara.ellsworth');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(onValid).not.toHaveBeenCalled();
    expect(screen.getByText('Must be an e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Must not be empty')).toBeInTheDocument();
    expect(screen.getByLabelText('E-mail')).toHaveFocus();
  });

  it('clears a field’s message as it is corrected, and sends the parsed body', async () => {
    const onValid = vi.fn();
    render(<LoginForm onValid={onValid} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await userEvent.type(screen.getByLabelText('E-mail'), ' Mara.Ellsworth@Example.org ');
    expect(screen.queryByText('Must be an e-mail address')).toBeNull();
    await userEvent.type(screen.getByLabelText('Password'), 'larkfield-mara');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    // The schema trims and lower-cases the address, as the API does.
    expect(onValid).toHaveBeenCalledWith({ email: 'mara.ellsworth@example.org', password: 'larkfield-mara' });
  });

  it('puts the API’s 400 fields beside the matching inputs', async () => {
    render(
      <LoginForm
        onValid={vi.fn()}
        apiError={badRequest([{ field: 'password', message: 'must be at most 200 characters' }])}
      />,
    );
    await userEvent.type(screen.getByLabelText('E-mail'), 'mara.ellsworth@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'larkfield-mara');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText('Must be at most 200 characters')).toBeInTheDocument();
    expect(screen.getByLabelText('Password')).toHaveFocus();
    expect(screen.queryByText('Some fields are not right')).toBeNull();
  });
});

describe('failureFromApi', () => {
  it('says fields the form does not have above it, with their names', () => {
    expect(failureFromApi(badRequest([{ field: 'extra', message: 'is not allowed' }]), ['email', 'password'])).toEqual({
      fields: {},
      message: 'extra: is not allowed',
    });
  });

  it('uses the API’s message when there are no fields, and plain words for a non-API failure', () => {
    const conflict = new ApiRequestError({
      statusCode: 503,
      error: 'Service Unavailable',
      message: 'The catalogue is loading',
    });
    expect(failureFromApi(conflict, ['email'])).toEqual({ fields: {}, message: 'The catalogue is loading' });
    expect(failureFromApi(new TypeError('boom'), ['email'])).toEqual({
      fields: {},
      message: 'Something went wrong. Try again.',
    });
  });
});
