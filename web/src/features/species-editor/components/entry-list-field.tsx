import { Button, Dropdown, Field, makeStyles, Option, Textarea, tokens } from '@fluentui/react-components';
import { CAUTION_KINDS, reconciliationSchema, type Source } from '@homeground/shared';
import { useId } from 'react';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';

const useStyles = makeStyles({
  set: {
    display: 'grid',
    gap: tokens.spacingVerticalS,
    margin: 0,
    padding: 0,
    border: 'none',
    minWidth: 0,
  },
  legend: { padding: 0, fontWeight: tokens.fontWeightSemibold, marginBottom: tokens.spacingVerticalXS },
  hint: { margin: 0, color: tokens.colorNeutralForeground2 },
  error: { margin: 0, color: tokens.colorPaletteRedForeground1 },
  list: { display: 'grid', gap: tokens.spacingVerticalM, margin: 0, padding: 0, listStyle: 'none' },
  entry: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(14rem, 1fr))',
    gap: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    alignItems: 'end',
    padding: tokens.spacingVerticalM,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
  },
  wide: { gridColumn: '1 / -1' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM, flexWrap: 'wrap' },
});

/** The two kinds of entry list the record keeps. */
export type EntryListKind = 'cautions' | 'reconciliations';

type Entry = Record<string, string>;

const RECONCILED_FIELDS = reconciliationSchema.shape.field.options;

/** The entries in a cell's JSON, or null when the text is not a list of plain objects (edited as text then). */
function entriesOf(json: string): Entry[] | null {
  try {
    const value: unknown = JSON.parse(json.trim() === '' ? '[]' : json);
    if (!Array.isArray(value)) return null;
    if (!value.every((e) => e && typeof e === 'object' && !Array.isArray(e))) return null;
    if (!value.every((e: object) => Object.values(e).every((x) => typeof x === 'string'))) return null;
    return value as Entry[];
  } catch {
    return null;
  }
}

export interface EntryListFieldProps {
  kind: EntryListKind;
  /** The cell's JSON text, as an exported CSV holds it. */
  value: string;
  onChange: (json: string) => void;
  sources: readonly Source[];
  /** The problem the shared schema found in this list, if any (from the form). */
  validationMessage?: string;
}

/**
 * Cautions and notes on the reference as entries a curator fills in one by one (kind, sentence and
 * source; or the fact and the note), written back as the same JSON the CSV column holds. A cell that is
 * not a list of entries (typed by hand, or from an older file) stays a text box so nothing is lost.
 */
export function EntryListField({ kind, value, onChange, sources, validationMessage }: EntryListFieldProps) {
  const styles = useStyles();
  const { t } = useTranslation('editor');
  const words = useWords();
  const messageId = useId();
  const entries = entriesOf(value);
  const label = t(`fields.${kind}`);

  if (!entries) {
    return (
      <Field
        label={label}
        hint={t('hints.json')}
        validationState={validationMessage ? 'error' : 'none'}
        validationMessage={validationMessage}
      >
        <Textarea name={kind} resize="vertical" value={value} onChange={(_, d) => onChange(d.value)} />
      </Field>
    );
  }

  const write = (next: Entry[]) => onChange(JSON.stringify(next));
  const edit = (index: number, key: string, text: string) =>
    write(entries.map((e, i) => (i === index ? { ...e, [key]: text } : e)));
  const blank: Entry = kind === 'cautions' ? { kind: 'toxic-if-eaten', text: '', source: '' } : { field: '', note: '' };
  const sourceName = (key: string) => (key === 'from-memory' ? t('source.fromMemory') : key);

  return (
    <fieldset className={styles.set} aria-describedby={validationMessage ? messageId : undefined}>
      <legend className={styles.legend}>{label}</legend>
      {entries.length === 0 ? <p className={styles.hint}>{t(`entries.${kind}.none`)}</p> : null}
      <ul className={styles.list}>
        {entries.map((entry, index) => {
          const n = index + 1;
          return (
            <li key={index} className={styles.entry}>
              {kind === 'cautions' ? (
                <>
                  <Field label={t('entries.cautions.kind', { n })} size="small">
                    <Dropdown
                      value={
                        (words.caution as Record<string, { title: string }>)[entry.kind ?? '']?.title ??
                        entry.kind ??
                        ''
                      }
                      selectedOptions={entry.kind ? [entry.kind] : []}
                      onOptionSelect={(_, d) => edit(index, 'kind', d.optionValue ?? '')}
                    >
                      {CAUTION_KINDS.map((k) => (
                        <Option key={k} value={k} text={words.caution[k].title}>
                          {words.caution[k].title}
                        </Option>
                      ))}
                    </Dropdown>
                  </Field>
                  <Field label={t('entries.cautions.source', { n })} size="small">
                    <Dropdown
                      placeholder={t('source.choose')}
                      value={entry.source ? sourceName(entry.source) : ''}
                      selectedOptions={entry.source ? [entry.source] : []}
                      onOptionSelect={(_, d) => edit(index, 'source', d.optionValue ?? '')}
                    >
                      {sources.map((s) => (
                        <Option key={s.key} value={s.key} text={sourceName(s.key)}>
                          {s.key === 'from-memory' ? t('source.fromMemory') : `${s.key}: ${s.citation.slice(0, 80)}`}
                        </Option>
                      ))}
                    </Dropdown>
                  </Field>
                  <Field
                    className={styles.wide}
                    label={t('entries.cautions.text', { n })}
                    hint={t('entries.cautions.textHint')}
                    size="small"
                  >
                    <Textarea
                      resize="vertical"
                      value={entry.text ?? ''}
                      onChange={(_, d) => edit(index, 'text', d.value)}
                    />
                  </Field>
                </>
              ) : (
                <>
                  <Field label={t('entries.reconciliations.field', { n })} size="small">
                    <Dropdown
                      placeholder={t('entries.reconciliations.chooseField')}
                      value={entry.field ?? ''}
                      selectedOptions={entry.field ? [entry.field] : []}
                      onOptionSelect={(_, d) => edit(index, 'field', d.optionValue ?? '')}
                    >
                      {RECONCILED_FIELDS.map((f) => (
                        <Option key={f} value={f}>
                          {f}
                        </Option>
                      ))}
                    </Dropdown>
                  </Field>
                  <Field className={styles.wide} label={t('entries.reconciliations.note', { n })} size="small">
                    <Textarea
                      resize="vertical"
                      value={entry.note ?? ''}
                      onChange={(_, d) => edit(index, 'note', d.value)}
                    />
                  </Field>
                </>
              )}
              <div className={styles.actions}>
                <Button onClick={() => write(entries.filter((_, i) => i !== index))}>
                  {t(`entries.${kind}.remove`, { n })}
                </Button>
              </div>
            </li>
          );
        })}
      </ul>
      {validationMessage ? (
        <p id={messageId} className={styles.error}>
          {validationMessage}
        </p>
      ) : null}
      <div className={styles.actions}>
        <Button onClick={() => write([...entries, blank])}>{t(`entries.${kind}.add`)}</Button>
      </div>
    </fieldset>
  );
}
