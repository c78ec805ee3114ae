import { zodIssueWordsFor } from '@homeground/shared';
import { useSchemaMessage } from './schema-messages.js';
import { useLocale } from '../i18n/index.js';
import { type FormEvent, useEffect, useRef, useState } from 'react';
import type { z } from 'zod';
import { failureFromApi, type FieldErrors, fieldErrorsFromZod, type FormFailure } from './field-errors.js';

/** A form whose values are all text inputs, checked by a shared zod object schema. */
type TextValues<S extends z.ZodType> = { [K in keyof z.input<S> & string]: string };

export interface SchemaFormOptions<S extends z.ZodType> {
  /** The shared request schema the API validates the same body with. */
  schema: S;
  initial: TextValues<S>;
}

/** Props for a Fluent `Field`: its message and state. */
export interface FieldValidation {
  validationMessage: string | undefined;
  validationState: 'error' | 'none';
}

/**
 * One form's values, per-field messages and form-wide failure, checked with a shared zod schema
 * before anything is sent, so the web says what the API would. A rejected submit (by the schema or
 * by the API's 400 `fields`) moves focus to the first invalid input, so keyboard and screen-reader
 * users land on the problem.
 */
export function useSchemaForm<S extends z.ZodType>({ schema, initial }: SchemaFormOptions<S>) {
  type Field = keyof TextValues<S> & string;
  const fields = Object.keys(initial) as Field[];
  const formRef = useRef<HTMLFormElement>(null);
  const say = useSchemaMessage();
  const { locale } = useLocale();
  const [values, setValues] = useState<TextValues<S>>(initial);
  const [errors, setErrors] = useState<FieldErrors<Field>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [attempt, setAttempt] = useState(0);

  useEffect(() => {
    if (attempt === 0) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [attempt]);
  const focusFirstInvalid = () => setAttempt((n) => n + 1);

  /** A new value clears that field's message: the person is fixing it. */
  const change = (field: Field, value: string) => {
    setValues((v) => ({ ...v, [field]: value }));
    setErrors((e) => ({ ...e, [field]: undefined }));
  };

  const validation = (field: Field): FieldValidation => ({
    validationMessage: errors[field],
    validationState: errors[field] ? 'error' : 'none',
  });

  /** Shows a failed submit: `failureFromApi` by default, or the caller's own reading of the error. */
  const fail = (
    error: unknown,
    describe: (error: unknown, fields: readonly Field[]) => FormFailure<Field> = failureFromApi,
  ) => {
    const described = describe(error, fields);
    setErrors(sayEach(described.fields, say));
    setFailure(described.message === null ? null : say(described.message));
    focusFirstInvalid();
  };

  /** The form's onSubmit: checks the values with the schema, then hands the parsed body on. */
  const handleSubmit = (onValid: (data: z.output<S>) => void) => (event: FormEvent) => {
    event.preventDefault();
    setFailure(null);
    // zod's own reasons (missing, wrong type) in the page's language, as the API would say them.
    const issueWords = zodIssueWordsFor(locale);
    const parsed = schema.safeParse(values, issueWords ? { error: issueWords } : undefined);
    if (!parsed.success) {
      setErrors(sayEach(fieldErrorsFromZod<Field>(parsed.error), say));
      focusFirstInvalid();
      return;
    }
    setErrors({});
    onValid(parsed.data);
  };

  return { formRef, values, errors, failure, fields, change, validation, fail, handleSubmit };
}

/** Each field's message in the page's language. */
function sayEach<K extends string>(errors: FieldErrors<K>, say: (message: string) => string): FieldErrors<K> {
  const out: FieldErrors<K> = {};
  for (const key of Object.keys(errors) as K[]) {
    const message = errors[key];
    if (message) out[key] = say(message);
  }
  return out;
}
