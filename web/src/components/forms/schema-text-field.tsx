import { useTranslation } from 'react-i18next';
import { Field, Input, type InputProps } from '@fluentui/react-components';
import { PASSWORD_MIN_LENGTH } from '@homeground/shared';
import type { FieldValidation } from '../../lib/forms/use-schema-form.js';

/** The parts of a `useSchemaForm` result one text field needs. */
export interface TextFieldForm<F extends string> {
  values: { [K in F]: string };
  change: (field: F, value: string) => void;
  validation: (field: F) => FieldValidation;
}

export interface SchemaTextFieldProps<F extends string> {
  form: TextFieldForm<F>;
  name: F;
  label: string;
  hint?: string;
  required?: boolean;
  type?: InputProps['type'];
  autoComplete?: string;
}

/** The hint every new-password field gives, beside the shared length rule, in the page's language. */
export function useNewPasswordHint(): string {
  const { t } = useTranslation('forms');
  return t('fields.newPasswordHint', { count: PASSWORD_MIN_LENGTH });
}

/**
 * One labelled text input bound to a schema form: its value, its change, and the message and state
 * the shared schema (or the API's 400) gives it.
 */
export function SchemaTextField<F extends string>({
  form,
  name,
  label,
  hint,
  required = false,
  type,
  autoComplete,
}: SchemaTextFieldProps<F>) {
  return (
    <Field label={label} hint={hint} required={required} {...form.validation(name)}>
      <Input
        type={type}
        name={name}
        autoComplete={autoComplete}
        value={form.values[name]}
        onChange={(_, d) => form.change(name, d.value)}
      />
    </Field>
  );
}
