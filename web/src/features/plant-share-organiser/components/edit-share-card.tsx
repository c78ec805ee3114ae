import { Button, MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { EditRegular } from '@fluentui/react-icons';
import type { PlantShare } from '@homeground/shared';
import { type FormEvent, useState } from 'react';
import { useEditShareMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { SchemaTextField } from '../../../components/forms/schema-text-field.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { failureFromApi } from '../../../lib/forms/field-errors.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { useTranslation } from 'react-i18next';
import { shareSettingsSchema, toEditShare } from '../utils/share-form.js';
import { renameFields } from './open-share-form.js';
import { useOrganiserStyles } from './organiser.styles.js';

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalL, maxWidth: '40rem' },
  pair: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr) minmax(0, 1fr)',
    gap: tokens.spacingHorizontalL,
    // On a phone the two limits stack: their labels are long (more so in Spanish) and the boxes need room.
    '@media (max-width: 480px)': { gridTemplateColumns: 'minmax(0, 1fr)' },
  },
  submit: { justifySelf: 'start', minHeight: '44px' },
});

/**
 * Changes an open share's day, place, limits and "what to bring". The API refuses limits below what a
 * household has reserved (400 beside the limit) and a new day once households have booked (409, said
 * above the button); nothing is saved then.
 */
export function EditShareCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const styles = useStyles();
  const organiser = useOrganiserStyles();
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  const edit = useEditShareMutation(share.groupSlug);
  const form = useSchemaForm({
    schema: shareSettingsSchema,
    initial: {
      date: share.date,
      placeName: share.place.name,
      address: share.place.address,
      directions: share.place.directions ?? '',
      perSpecies: String(share.limits.perSpecies),
      total: String(share.limits.total),
      whatToBring: share.whatToBring ?? '',
    },
  });

  const submit = (event: FormEvent) => {
    setSaved(false);
    form.handleSubmit((settings) =>
      edit.mutate(toEditShare(settings), {
        onSuccess: () => (setSaved(true), setEditing(false)),
        onError: (error) => form.fail(error, (e, fields) => failureFromApi(renameFields(e), fields)),
      }),
    )(event);
  };

  return (
    <ContentCard aria-labelledby="edit-share">
      <Heading level="section" id="edit-share">
        {t('editHeading')}
      </Heading>
      <p className={organiser.lead}>{t('editLead')}</p>
      {saved ? (
        <MessageBar intent="success">
          <MessageBarBody>{t('saved')}</MessageBarBody>
        </MessageBar>
      ) : null}
      {editing ? (
        <form ref={form.formRef} className={styles.form} onSubmit={submit} noValidate aria-labelledby="edit-share">
          <SchemaTextField form={form} name="date" label={t('date')} type="date" required />
          <SchemaTextField form={form} name="placeName" label={t('placeName')} hint={t('placeHint')} required />
          <SchemaTextField form={form} name="address" label={t('address')} required autoComplete="street-address" />
          <SchemaTextField form={form} name="directions" label={t('directions')} hint={t('directionsHint')} />
          <SchemaTextField form={form} name="whatToBring" label={t('whatToBring')} hint={t('whatToBringHint')} />
          <div className={styles.pair}>
            <SchemaTextField form={form} name="perSpecies" label={t('limitPerSpecies')} required />
            <SchemaTextField form={form} name="total" label={t('limitTotal')} required />
          </div>
          {form.failure ? (
            <MessageBar intent="error">
              <MessageBarBody>{form.failure}</MessageBarBody>
            </MessageBar>
          ) : null}
          <div className={organiser.actions}>
            <Button className={styles.submit} type="submit" appearance="primary" disabled={edit.isPending}>
              {edit.isPending ? t('saving') : t('save')}
            </Button>
            <Button onClick={() => setEditing(false)}>{t('editHide')}</Button>
          </div>
        </form>
      ) : (
        <Button icon={<EditRegular />} onClick={() => (setEditing(true), setSaved(false))}>
          {t('editShow')}
        </Button>
      )}
    </ContentCard>
  );
}
