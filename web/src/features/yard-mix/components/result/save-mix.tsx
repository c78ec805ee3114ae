import { Button, Field, Input, makeStyles, MessageBar, MessageBarBody, tokens } from '@fluentui/react-components';
import { Save20Regular } from '@fluentui/react-icons';
import { type SaveMixRequest, saveMixRequestSchema } from '@homeground/shared';
import { useState, type FormEvent } from 'react';
import { useTranslation } from 'react-i18next';
import { usePublicOrigin } from '../../../../api/system/system.queries.js';
import { useSaveMixMutation } from '../../../../api/mixes/mixes.mutations.js';
import { RouterButton, RouterLink } from '../../../../components/links/router-link.js';
import { paths } from '../../../../config/paths.js';
import { CopyLinkButton } from './share-link.js';

const useStyles = makeStyles({
  form: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'flex-end', flexWrap: 'wrap' },
  name: { flexGrow: 1, minWidth: '12rem', maxWidth: '24rem' },
  saved: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
});

export interface SaveMixProps {
  isSignedIn: boolean;
  /** Sign-in page that comes back to this very mix. */
  signInHref: string;
  defaultName: string;
  /** The request and species to save, read at the moment of saving. */
  buildRequest: (name: string) => SaveMixRequest;
}

/** The screen's primary action: save the mix (signed in) or sign in to save it. */
export function SaveMix({ isSignedIn, signInHref, defaultName, buildRequest }: SaveMixProps) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const save = useSaveMixMutation();
  const origin = usePublicOrigin();
  const [isOpen, setIsOpen] = useState(false);
  const [name, setName] = useState(defaultName);
  const [error, setError] = useState<string | undefined>();

  if (!isSignedIn) {
    return (
      <RouterButton to={signInHref} appearance="primary" icon={<Save20Regular />}>
        {t('save.signIn')}
      </RouterButton>
    );
  }

  if (save.data) {
    const href = paths.savedMix.build(save.data.id);
    return (
      <div className={styles.saved}>
        <MessageBar intent="success" layout="multiline">
          <MessageBarBody>
            {t('save.saved', { name: save.data.name })} <RouterLink to={href}>{href}</RouterLink>
          </MessageBarBody>
        </MessageBar>
        <CopyLinkButton url={`${origin}${href}`} label={t('save.copySaved')} />
      </div>
    );
  }

  if (!isOpen) {
    return (
      <Button appearance="primary" icon={<Save20Regular />} onClick={() => setIsOpen(true)}>
        {t('save.open')}
      </Button>
    );
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const request = buildRequest(name);
    const parsed = saveMixRequestSchema.safeParse(request);
    if (!parsed.success) {
      const issue = parsed.error.issues.find((i) => i.path[0] === 'name') ?? parsed.error.issues[0];
      setError(issue?.path[0] === 'name' ? t('save.nameError') : t('save.cannotSave'));
      return;
    }
    setError(undefined);
    save.mutate(request, { onError: (e) => setError(e.message) });
  };

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label={t('save.open')}>
      <Field
        className={styles.name}
        label={t('save.name')}
        required
        validationMessage={error}
        validationState={error ? 'error' : 'none'}
      >
        <Input value={name} maxLength={80} onChange={(_, d) => setName(d.value)} />
      </Field>
      <Button type="submit" appearance="primary" icon={<Save20Regular />} disabled={save.isPending}>
        {save.isPending ? t('save.saving') : t('save.save')}
      </Button>
      <Button type="button" appearance="subtle" onClick={() => setIsOpen(false)}>
        {t('save.cancel')}
      </Button>
    </form>
  );
}
