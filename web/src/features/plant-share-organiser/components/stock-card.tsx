import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
} from '@fluentui/react-components';
import { AddRegular, SaveRegular } from '@fluentui/react-icons';
import { addStockRequestSchema, type PlantShare, setStockRequestSchema } from '@homeground/shared';
import { useState } from 'react';
import { useAddStockMutation, useSetStockMutation } from '../../../api/plant-share/plant-share.mutations.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { asSentence } from '../../../lib/forms/field-errors.js';
import { useTranslation } from 'react-i18next';
import { useOrganiserStyles } from './organiser.styles.js';

type Drafts = Record<string, string>;

/**
 * The plants on offer per species: set a count (as the batches' ready counts change) or add plants
 * that got ready. Each action sends every changed row in one request, checked by the shared schema
 * first; a bad row is named beside itself and nothing is sent.
 */
export function StockCard({ share }: { share: PlantShare }) {
  const { t } = useTranslation('organiser');
  const styles = useOrganiserStyles();
  const setStock = useSetStockMutation(share.groupSlug);
  const addStock = useAddStockMutation(share.groupSlug);
  const initial = () => Object.fromEntries(share.stock.map((s) => [s.speciesSlug, String(s.offered)]));
  const [counts, setCounts] = useState<Drafts>(initial);
  const [adds, setAdds] = useState<Drafts>({});
  const [errors, setErrors] = useState<Drafts>({});
  const [note, setNote] = useState<{ intent: 'success' | 'error'; text: string } | null>(null);
  const slugs = share.stock.map((s) => s.speciesSlug);

  /** The schema's issues by species, worded for the row. */
  const rowErrors = (
    issues: readonly { path: PropertyKey[]; message: string }[],
    key: 'stock' | 'lines',
    from: string[],
  ) =>
    Object.fromEntries(
      issues.filter((i) => i.path[0] === key).map((i) => [from[Number(i.path[1])] ?? '', asSentence(i.message)]),
    );

  const saveCounts = () => {
    setNote(null);
    const changed = share.stock.filter((s) => counts[s.speciesSlug] !== String(s.offered));
    const body = { stock: changed.map((s) => ({ speciesSlug: s.speciesSlug, count: Number(counts[s.speciesSlug]) })) };
    const parsed = setStockRequestSchema.safeParse(body);
    if (!parsed.success)
      return setErrors(
        rowErrors(
          parsed.error.issues,
          'stock',
          changed.map((s) => s.speciesSlug),
        ),
      );
    setErrors({});
    setStock.mutate(parsed.data, {
      onSuccess: () => setNote({ intent: 'success', text: t('stockSaved') }),
      onError: (e) => setNote({ intent: 'error', text: e.message }),
    });
  };

  const addPlants = () => {
    setNote(null);
    const listed = slugs.filter((slug) => (adds[slug] ?? '').trim() !== '');
    if (listed.length === 0) return setNote({ intent: 'error', text: t('nothingToAdd') });
    const body = { lines: listed.map((slug) => ({ speciesSlug: slug, count: Number(adds[slug]) })) };
    const parsed = addStockRequestSchema.safeParse(body);
    if (!parsed.success)
      return setErrors(
        rowErrors(
          parsed.error.issues,
          'lines',
          listed.map((slug) => `add:${slug}`),
        ),
      );
    setErrors({});
    addStock.mutate(parsed.data, {
      onSuccess: (next) => {
        setAdds({});
        setCounts(Object.fromEntries(next.stock.map((s) => [s.speciesSlug, String(s.offered)])));
        setNote({ intent: 'success', text: t('stockAdded') });
      },
      onError: (e) => setNote({ intent: 'error', text: e.message }),
    });
  };

  return (
    <ContentCard aria-labelledby="share-stock">
      <Heading level="section" id="share-stock">
        {t('stockHeading')}
      </Heading>
      <p className={styles.lead}>{t('stockLead')}</p>
      <div className={styles.scroller} role="region" aria-label={t('stockTableLabel')} tabIndex={0}>
        <Table className={styles.table} aria-labelledby="share-stock">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>{t('species')}</TableHeaderCell>
              <TableHeaderCell>{t('offered')}</TableHeaderCell>
              <TableHeaderCell>{t('remaining')}</TableHeaderCell>
              <TableHeaderCell>{t('reservedCol')}</TableHeaderCell>
              <TableHeaderCell>{t('givenCol')}</TableHeaderCell>
              <TableHeaderCell>{t('waitlistedCol')}</TableHeaderCell>
              <TableHeaderCell>{t('addCol')}</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {share.stock.map((s) => (
              <TableRow key={s.speciesSlug}>
                <TableCell>
                  {s.commonName}
                  <span className={styles.scientific}>{s.scientificName}</span>
                </TableCell>
                <TableCell>
                  <Field
                    validationMessage={errors[s.speciesSlug]}
                    validationState={errors[s.speciesSlug] ? 'error' : 'none'}
                  >
                    <Input
                      className={styles.number}
                      inputMode="numeric"
                      aria-label={t('stockOf', { name: s.commonName })}
                      value={counts[s.speciesSlug] ?? ''}
                      onChange={(_, d) => setCounts((c) => ({ ...c, [s.speciesSlug]: d.value }))}
                    />
                  </Field>
                </TableCell>
                <TableCell>{s.remaining}</TableCell>
                <TableCell>{s.reserved}</TableCell>
                <TableCell>{s.given}</TableCell>
                <TableCell>{s.waitlisted}</TableCell>
                <TableCell>
                  <Field
                    validationMessage={errors[`add:${s.speciesSlug}`]}
                    validationState={errors[`add:${s.speciesSlug}`] ? 'error' : 'none'}
                  >
                    <Input
                      className={styles.number}
                      inputMode="numeric"
                      aria-label={t('addOf', { name: s.commonName })}
                      value={adds[s.speciesSlug] ?? ''}
                      onChange={(_, d) => setAdds((a) => ({ ...a, [s.speciesSlug]: d.value }))}
                    />
                  </Field>
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      </div>
      {note ? (
        <MessageBar intent={note.intent}>
          <MessageBarBody>{note.text}</MessageBarBody>
        </MessageBar>
      ) : null}
      <div className={styles.actions}>
        <Button icon={<SaveRegular />} onClick={saveCounts} disabled={setStock.isPending}>
          {t('saveStock')}
        </Button>
        <Button icon={<AddRegular />} onClick={addPlants} disabled={addStock.isPending}>
          {t('addStock')}
        </Button>
      </div>
    </ContentCard>
  );
}
