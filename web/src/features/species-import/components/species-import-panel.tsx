import {
  Button,
  Field,
  makeStyles,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  tokens,
} from '@fluentui/react-components';
import type { CsvImportResult, CsvRowError } from '@homeground/shared';
import { useId, useState } from 'react';
import { useTranslation } from 'react-i18next';
import { useImportSpeciesMutation } from '../../../api/species/species-import.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gap: tokens.spacingVerticalL },
  row: { display: 'flex', gap: tokens.spacingHorizontalM, alignItems: 'end', flexWrap: 'wrap' },
  table: { width: '100%', borderCollapse: 'collapse', fontVariantNumeric: 'tabular-nums' },
  cell: {
    textAlign: 'start',
    verticalAlign: 'top',
    padding: tokens.spacingVerticalXS,
    borderBottom: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    overflowWrap: 'anywhere',
  },
});

/**
 * Import on screen: the file is first sent as a dry run, which answers what it would add and change
 * (or every bad row with its line number); only then can the curator import it, all or nothing.
 */
export function SpeciesImportPanel() {
  const styles = useStyles();
  const { t } = useTranslation('importer');
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<CsvImportResult | null>(null);
  const [done, setDone] = useState<CsvImportResult | null>(null);
  const [rows, setRows] = useState<CsvRowError[] | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const mutation = useImportSpeciesMutation();
  const fileId = useId();

  const reset = () => {
    setPreview(null);
    setDone(null);
    setRows(null);
    setFailure(null);
  };
  const onError = (e: unknown) => {
    if (isApiRequestError(e) && e.rows?.length) setRows(e.rows);
    else setFailure(e instanceof Error ? e.message : String(e));
  };
  const check = () => {
    reset();
    if (!file) return setFailure(t('file.choose'));
    mutation.mutate({ file, dryRun: true }, { onSuccess: setPreview, onError });
  };
  const write = () => {
    if (!file) return;
    mutation.mutate(
      { file, dryRun: false },
      {
        onSuccess: (r) => {
          reset();
          setDone(r);
        },
        onError,
      },
    );
  };
  const toWrite = preview?.preview.filter((p) => p.action !== 'unchanged').length ?? 0;

  return (
    <div className={styles.stack}>
      <ContentCard>
        <div className={styles.row}>
          <Field label={{ children: t('file.label'), htmlFor: fileId }} hint={t('file.hint')}>
            <input
              id={fileId}
              type="file"
              accept=".csv,text/csv"
              onChange={(e) => {
                setFile(e.target.files?.[0] ?? null);
                reset();
              }}
            />
          </Field>
          <Button onClick={check} disabled={mutation.isPending}>
            {mutation.isPending ? t('file.checking') : t('file.check')}
          </Button>
        </div>
      </ContentCard>
      {failure ? (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{failure}</MessageBarBody>
        </MessageBar>
      ) : null}
      {done ? (
        <MessageBar intent="success" role="status">
          <MessageBarBody>
            <MessageBarTitle>{t('done.title')}</MessageBarTitle>
            {t('done.text', { created: done.created, updated: done.updated })}
          </MessageBarBody>
        </MessageBar>
      ) : null}
      {rows ? (
        <ContentCard aria-labelledby="import-errors">
          <Heading level="section" id="import-errors">
            {t('errors.title')}
          </Heading>
          <p role="alert">{t('errors.summary', { count: rows.length })}</p>
          <table className={styles.table}>
            <thead>
              <tr>
                <th className={styles.cell}>{t('errors.line')}</th>
                <th className={styles.cell}>{t('errors.field')}</th>
                <th className={styles.cell}>{t('errors.message')}</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r, i) => (
                <tr key={`${r.row}-${r.field}-${i}`}>
                  <td className={styles.cell}>{r.row}</td>
                  <td className={styles.cell}>{r.field}</td>
                  <td className={styles.cell}>{r.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ContentCard>
      ) : null}
      {preview ? (
        <ContentCard aria-labelledby="import-preview">
          <Heading level="section" id="import-preview">
            {t('preview.title')}
          </Heading>
          <p role="status">
            {t('preview.summary', {
              created: preview.created,
              changed: preview.preview.filter((p) => p.action === 'change').length,
              unchanged: preview.preview.filter((p) => p.action === 'unchanged').length,
            })}
          </p>
          <table className={styles.table}>
            <thead>
              <tr>
                <th className={styles.cell}>{t('preview.line')}</th>
                <th className={styles.cell}>{t('preview.species')}</th>
                <th className={styles.cell}>{t('preview.action')}</th>
                <th className={styles.cell}>{t('preview.fields')}</th>
              </tr>
            </thead>
            <tbody>
              {preview.preview.map((p) => (
                <tr key={p.line}>
                  <td className={styles.cell}>{p.line}</td>
                  <td className={styles.cell}>
                    <i>{p.scientificName}</i> ({p.slug})
                  </td>
                  <td className={styles.cell}>{t(`preview.${p.action}`)}</td>
                  <td className={styles.cell}>{p.fields.join(', ')}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {toWrite > 0 ? (
            <Button appearance="primary" onClick={write} disabled={mutation.isPending}>
              {mutation.isPending ? t('preview.importing') : t('preview.import', { count: toWrite })}
            </Button>
          ) : (
            <p>{t('preview.nothing')}</p>
          )}
        </ContentCard>
      ) : null}
    </div>
  );
}
