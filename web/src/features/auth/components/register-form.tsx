import { useEffect, useRef, useState } from 'react';
import { Button, Text } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { registerRequestSchema, type RegisterAccepted } from '@homeground/shared';
import { useRegisterMutation } from '../../../api/auth/auth.mutations.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { describeAuthFailure } from '../utils/form-errors.js';
import { useAuthFormStyles } from './auth-form.styles.js';
import { FormFailure } from './form-failure.js';
import { SubmitButton } from './submit-button.js';
import { SchemaTextField, useNewPasswordHint } from '../../../components/forms/schema-text-field.js';

/** What the person types; the page adds where they were going. */
const fieldsSchema = registerRequestSchema.omit({ next: true });

/**
 * Name, e-mail and password, checked with the shared schema. The answer is always "check your e-mail"
 * (the page never says whether an address has an account); the e-mailed link makes the account.
 */
export function RegisterForm({ next }: { next?: string }) {
  const [sent, setSent] = useState<RegisterAccepted | null>(null);
  if (sent) return <CheckYourEmail sent={sent} onAgain={() => setSent(null)} />;
  return <RegisterFields next={next} onSent={setSent} />;
}

function RegisterFields({ next, onSent }: { next?: string; onSent: (sent: RegisterAccepted) => void }) {
  const styles = useAuthFormStyles();
  const { t } = useTranslation('forms');
  const newPasswordHint = useNewPasswordHint();
  const registerAccount = useRegisterMutation();
  const form = useSchemaForm({ schema: fieldsSchema, initial: { displayName: '', email: '', password: '' } });

  const submit = form.handleSubmit((body) =>
    registerAccount.mutate(next ? { ...body, next } : body, {
      onSuccess: onSent,
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

/** What happens next, said where the form was; focus moves here so a screen reader hears it. */
function CheckYourEmail({ sent, onAgain }: { sent: RegisterAccepted; onAgain: () => void }) {
  const styles = useAuthFormStyles();
  const { t } = useTranslation('forms');
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => heading.current?.focus(), []);
  return (
    <section className={styles.form} aria-labelledby="register-check-title">
      <h2 id="register-check-title" ref={heading} tabIndex={-1}>
        {t('register.checkTitle')}
      </h2>
      <Text as="p">{t('register.checkBody', { email: sent.email, hours: sent.expiresInHours })}</Text>
      <Text as="p">{t('register.checkElse')}</Text>
      <div className={styles.actions}>
        <Button appearance="secondary" onClick={onAgain}>
          {t('register.again')}
        </Button>
      </div>
    </section>
  );
}
