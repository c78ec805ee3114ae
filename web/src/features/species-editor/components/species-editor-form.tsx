import {
  Button,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarBody,
  Option,
  Dropdown,
  Textarea,
  tokens,
} from '@fluentui/react-components';
import {
  COMMERCIAL_AVAILABILITY,
  DEER_RESISTANCE,
  FLOWER_COLOURS,
  type FlowerColour,
  formatHeightRangeCm,
  formFieldForApiPath,
  GROWTH_FORMS,
  HABITATS,
  LIFESPANS,
  MOISTURE_LEVELS,
  monthsFromText,
  SOIL_TEXTURES,
  type Source,
  type SourcedField,
  sourceFieldOf,
  SOWING_METHODS,
  type Species,
  speciesFormSchema,
  type SpeciesFormField,
  type SpeciesFormTextColumn,
  type SpeciesFormValues,
  SPREAD_HABITS,
  SUN_LEVELS,
  WETLAND_INDICATORS,
} from '@homeground/shared';
import type { ReactNode } from 'react';
import { useTranslation } from 'react-i18next';
import { useSaveSpeciesMutation } from '../../../api/species/species-editor.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { asSentence, failureFromApi, type FormFailure } from '../../../lib/forms/field-errors.js';
import { useSchemaForm } from '../../../lib/forms/use-schema-form.js';
import { SECTIONS, type EditorField } from '../utils/editor-layout.js';
import { EntryListField } from './entry-list-field.js';

const useStyles = makeStyles({
  form: { display: 'grid', gap: tokens.spacingVerticalXL },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(16rem, 1fr))',
    gap: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalL}`,
    alignItems: 'start',
  },
  wide: { gridColumn: '1 / -1' },
  fact: { display: 'grid', gap: tokens.spacingVerticalXS },
  preview: { margin: 0, color: tokens.colorNeutralForeground2, fontVariantNumeric: 'tabular-nums' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM },
});

/** The enum a single-choice field takes its options from (blank allowed where the fact may be unknown). */
const CHOICES: Partial<Record<SpeciesFormTextColumn, { values: readonly string[]; blank?: boolean }>> = {
  growthForm: { values: GROWTH_FORMS },
  lifespan: { values: LIFESPANS },
  spreadHabit: { values: SPREAD_HABITS },
  deerResistance: { values: DEER_RESISTANCE },
  wetlandIndicator: { values: WETLAND_INDICATORS, blank: true },
  commercialAvailability: { values: COMMERCIAL_AVAILABILITY, blank: true },
  needsAcidSoil: { values: ['true', 'false'] },
  monarchHost: { values: ['true', 'false'] },
  selfSows: { values: ['true', 'false'] },
  needsLight: { values: ['true', 'false'] },
};

/** The allowed values a ";"-list field names in its hint. */
const LISTS: Partial<Record<SpeciesFormTextColumn, readonly string[]>> = {
  flowerColours: FLOWER_COLOURS,
  sun: SUN_LEVELS,
  moisture: MOISTURE_LEVELS,
  sunOptimum: SUN_LEVELS,
  moistureOptimum: MOISTURE_LEVELS,
  soilTextures: SOIL_TEXTURES,
  habitats: HABITATS,
  methods: SOWING_METHODS,
};

const LONG: SpeciesFormTextColumn[] = ['pollinators', 'birds', 'cautions', 'reconciliations', 'nativeStates'];

/** The API names record paths ("heightCm.min", "sources.heightCm"); each goes beside its own input. */
function failureFromSpeciesApi(error: unknown, fields: readonly SpeciesFormField[]): FormFailure<SpeciesFormField> {
  if (!isApiRequestError(error)) return failureFromApi(error, fields);
  const out: Partial<Record<SpeciesFormField, string>> = {};
  const loose: string[] = [];
  for (const [path, message] of Object.entries(error.fieldMessages())) {
    const field = formFieldForApiPath(path);
    if (field && fields.includes(field)) out[field] ??= asSentence(message);
    else loose.push(`${path}: ${message}`);
  }
  const message = loose.length > 0 ? loose.join('; ') : Object.keys(out).length > 0 ? null : error.message;
  return { fields: out, message };
}

function numberOrNull(text: string): number | null {
  const n = Number(text);
  return text.trim() !== '' && Number.isFinite(n) && n > 0 ? n : null;
}

export interface SpeciesEditorFormProps {
  /** The record being edited, by its current slug; undefined adds a new species. */
  slug?: string;
  initial: SpeciesFormValues;
  sources: Source[];
  /** The bloom strip drawn from the months and colours typed so far (the route passes the catalogue's own). */
  renderBloomStrip: (bloomMonths: number[], flowerColours: FlowerColour[]) => ReactNode;
  onSaved: (record: Species) => void;
  onCancel: () => void;
}

/**
 * The curator's species form: every field of the shared species schema as text, each sourced fact
 * with its source from the registry, sizes previewed in both unit systems and the bloom strip drawn
 * as the curator types. The shared schema checks it before sending; the API saves all or nothing.
 */
export function SpeciesEditorForm({
  slug,
  initial,
  sources,
  renderBloomStrip,
  onSaved,
  onCancel,
}: SpeciesEditorFormProps) {
  const styles = useStyles();
  const { t } = useTranslation('editor');
  const form = useSchemaForm({ schema: speciesFormSchema, initial });
  const save = useSaveSpeciesMutation(slug);
  const v = form.values;

  const sizePreview = (minKey: 'heightMinCm' | 'spreadMinCm', maxKey: 'heightMaxCm' | 'spreadMaxCm') => {
    const min = numberOrNull(v[minKey]);
    const max = numberOrNull(v[maxKey]);
    if (min === null || max === null || min > max) return t('preview.noRange');
    const range = formatHeightRangeCm(min, max);
    return minKey === 'heightMinCm' ? t('preview.height', { range }) : t('preview.spread', { range });
  };
  const depthMm = Number(v.sowingDepthMm);
  const depthPreview =
    v.sowingDepthMm.trim() === '' || !Number.isFinite(depthMm)
      ? null
      : depthMm === 0
        ? t('preview.surface')
        : t('preview.depth', { depth: `${(depthMm / 25.4).toFixed(2)} in (${depthMm} mm)` });
  const colours = v.flowerColours
    .split(';')
    .map((c) => c.trim())
    .filter((c): c is FlowerColour => (FLOWER_COLOURS as readonly string[]).includes(c));

  const sourcePicker = (fact: SourcedField) => {
    const name = sourceFieldOf(fact);
    const chosen = sources.find((s) => s.key === v[name]);
    return (
      <Field label={t('source.label', { fact: t(`facts.${fact}`) })} size="small" {...form.validation(name)}>
        <Dropdown
          name={name}
          placeholder={t('source.choose')}
          value={chosen ? (chosen.key === 'from-memory' ? t('source.fromMemory') : chosen.key) : ''}
          selectedOptions={v[name] ? [v[name]] : []}
          onOptionSelect={(_, d) => form.change(name, d.optionValue ?? '')}
        >
          {sources.map((s) => (
            <Option key={s.key} value={s.key} text={s.key === 'from-memory' ? t('source.fromMemory') : s.key}>
              {s.key === 'from-memory' ? t('source.fromMemory') : `${s.key}: ${s.citation.slice(0, 80)}`}
            </Option>
          ))}
        </Dropdown>
      </Field>
    );
  };

  const input = (field: SpeciesFormTextColumn) => {
    const choice = CHOICES[field];
    const list = LISTS[field];
    const hint =
      field === 'bloomMonths'
        ? t('hints.months')
        : field === 'treatments'
          ? t('hints.treatments')
          : field === 'cautions' || field === 'reconciliations'
            ? t('hints.json')
            : field.endsWith('Cm')
              ? t('hints.cm')
              : list
                ? t('hints.allowed', { values: list.join('; ') })
                : [
                      'commonNames',
                      'synonyms',
                      'specialistBees',
                      'nativeStates',
                      'ecoregions',
                      'protectedIn',
                      'tags',
                    ].includes(field)
                  ? t('hints.list')
                  : ['lepidopteraGenusCount', 'seedsPerPound', 'birds'].includes(field)
                    ? t('hints.blank')
                    : undefined;
    const label = t(`fields.${field}`);
    if (choice) {
      const optionText = (value: string) =>
        value === 'true' || value === 'false' ? t(`yesNo.${value}`) : value === '' ? t('yesNo.unknown') : value;
      const options = choice.blank ? ['', ...choice.values] : [...choice.values];
      return (
        <Field label={label} {...form.validation(field)}>
          <Dropdown
            name={field}
            value={v[field] === '' && !choice.blank ? '' : optionText(v[field])}
            selectedOptions={[v[field]]}
            onOptionSelect={(_, d) => form.change(field, d.optionValue ?? '')}
          >
            {options.map((o) => (
              <Option key={o || 'blank'} value={o} text={optionText(o)}>
                {optionText(o)}
              </Option>
            ))}
          </Dropdown>
        </Field>
      );
    }
    if (field === 'cautions' || field === 'reconciliations') {
      return (
        <EntryListField
          kind={field}
          value={v[field]}
          onChange={(json) => form.change(field, json)}
          sources={sources}
          validationMessage={form.errors[field]}
        />
      );
    }
    if (LONG.includes(field)) {
      return (
        <Field label={label} hint={hint} {...form.validation(field)}>
          <Textarea name={field} resize="vertical" value={v[field]} onChange={(_, d) => form.change(field, d.value)} />
        </Field>
      );
    }
    return (
      <Field label={label} hint={hint} {...form.validation(field)}>
        <Input name={field} value={v[field]} onChange={(_, d) => form.change(field, d.value)} />
      </Field>
    );
  };

  const cell = (item: EditorField) => (
    <div key={item.field} className={LONG.includes(item.field) ? `${styles.fact} ${styles.wide}` : styles.fact}>
      {input(item.field)}
      {item.source ? sourcePicker(item.source) : null}
      {item.field === 'heightMaxCm' ? (
        <p className={styles.preview}>{sizePreview('heightMinCm', 'heightMaxCm')}</p>
      ) : null}
      {item.field === 'spreadMaxCm' ? (
        <p className={styles.preview}>{sizePreview('spreadMinCm', 'spreadMaxCm')}</p>
      ) : null}
      {item.field === 'sowingDepthMm' && depthPreview ? <p className={styles.preview}>{depthPreview}</p> : null}
    </div>
  );

  return (
    <form
      ref={form.formRef}
      className={styles.form}
      noValidate
      aria-label={slug ? t('save.update') : t('save.create')}
      onSubmit={form.handleSubmit((record) =>
        save.mutate(record, { onSuccess: onSaved, onError: (e) => form.fail(e, failureFromSpeciesApi) }),
      )}
    >
      {form.failure || Object.values(form.errors).some(Boolean) ? (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{form.failure ?? t('save.failed')}</MessageBarBody>
        </MessageBar>
      ) : null}
      {SECTIONS.map((section) => (
        <ContentCard key={section.id} aria-labelledby={`editor-${section.id}`}>
          <Heading level="section" id={`editor-${section.id}`}>
            {t(`sections.${section.id}`)}
          </Heading>
          <div className={styles.grid}>{section.fields.map(cell)}</div>
          {section.id === 'bloom' ? (
            <div aria-live="polite">
              <p className={styles.preview}>{t('preview.bloom')}</p>
              {renderBloomStrip(monthsFromText(v.bloomMonths), colours)}
            </div>
          ) : null}
        </ContentCard>
      ))}
      <div className={styles.actions}>
        <Button appearance="primary" type="submit" disabled={save.isPending}>
          {save.isPending ? t('save.saving') : slug ? t('save.update') : t('save.create')}
        </Button>
        <Button onClick={onCancel}>{t('save.cancel')}</Button>
      </div>
    </form>
  );
}
