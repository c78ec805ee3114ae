import { Button, MessageBar, MessageBarBody, makeStyles, tokens } from '@fluentui/react-components';
import { ArrowDownloadRegular, PrintRegular } from '@fluentui/react-icons';
import type { ShareReport } from '@homeground/shared';
import { useMutation, useQuery } from '@tanstack/react-query';
import { downloadShareReportCsv } from '../../../api/plant-share/plant-share.api.js';
import { shareReportQueryOptions } from '../../../api/plant-share/plant-share.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { EmptyState, ErrorState, QueryState } from '../../../components/states/index.js';
import { isApiRequestError } from '../../../lib/api-request-error.js';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../lib/i18n/index.js';
import { BarTable } from './bar-table.js';
import { GerminationTables } from './germination-tables.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalXL },
  figures: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(10rem, 1fr))',
    gap: tokens.spacingHorizontalL,
    margin: 0,
    padding: 0,
    listStyle: 'none',
  },
  figure: { margin: 0, display: 'flex', flexDirection: 'column' },
  number: {
    fontSize: tokens.fontSizeHero700,
    lineHeight: tokens.lineHeightHero700,
    fontWeight: tokens.fontWeightSemibold,
    fontVariantNumeric: 'tabular-nums',
    margin: 0,
    color: tokens.colorBrandForeground1,
  },
  label: { color: tokens.colorNeutralForeground2 },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalXS },
  lead: { marginTop: 0, maxWidth: '68ch' },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, marginTop: tokens.spacingVerticalL },
});

/** The season report for the group's organisers: figures, charts as tables with bars, and the CSV. */
export function ShareReportPage({ groupSlug }: { groupSlug: string }) {
  const report = useQuery(shareReportQueryOptions(groupSlug));
  const { t } = useTranslation('report');
  return (
    <QueryState
      query={report}
      loading={t('loading')}
      error={(error, retry) =>
        isApiRequestError(error) && error.statusCode === 404 ? (
          <EmptyState title={t('noShare')} />
        ) : (
          <ErrorState title={t('loadFailed')} message={error.message} onRetry={retry} />
        )
      }
    >
      {(r) => <Report report={r} />}
    </QueryState>
  );
}

function Report({ report }: { report: ShareReport }) {
  const styles = useStyles();
  const { t } = useTranslation('report');
  const format = useFormatters();
  const totals = report.totals;
  const plants = (n: number) => t('plants', { count: n, formatted: format.number(n) });
  const csv = useMutation({
    mutationFn: () => downloadShareReportCsv(report.groupSlug),
    onSuccess: (blob) => {
      const url = URL.createObjectURL(blob);
      const a = document.createElement('a');
      a.href = url;
      a.download = `season-report-${report.groupSlug}-${report.seasonYear}.csv`;
      a.click();
      URL.revokeObjectURL(url);
    },
  });
  const figures: [number, string][] = [
    [totals.plantsGiven, t('plantsGiven')],
    [totals.households, t('households', { walkUps: format.number(totals.walkUps) })],
    [totals.milkweedPlants, t('milkweeds')],
    [totals.species, t('species')],
  ];
  return (
    <>
      <PageIntro title={t('title', { year: report.seasonYear })}>
        {t('lead', { group: report.groupName, date: format.date(report.shareDate) })}
      </PageIntro>
      <div className={styles.stack}>
        <ContentCard aria-labelledby="report-impact">
          <Heading level="section" id="report-impact">
            {t('impactHeading')}
          </Heading>
          <ul className={styles.figures} aria-label={t('figures')}>
            {figures.map(([n, label]) => (
              <li key={label} className={styles.figure}>
                <span className={styles.number}>{format.number(n)}</span> <span className={styles.label}>{label}</span>
              </li>
            ))}
          </ul>
          <p>
            {totals.shareOfTargets === null
              ? t('noTargets')
              : t('ofTargets', {
                  pct: format.number(Math.round(totals.shareOfTargets * 100)),
                  target: format.number(totals.targetPlants),
                })}
          </p>
          <ul className={styles.list}>
            {report.summary.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          <div className={styles.actions} data-print="hide">
            <Button icon={<ArrowDownloadRegular />} onClick={() => csv.mutate()} disabled={csv.isPending}>
              {t('csv')}
            </Button>
            <Button icon={<PrintRegular />} onClick={() => window.print()}>
              {t('print')}
            </Button>
          </div>
          {csv.isError ? (
            <MessageBar intent="error">
              <MessageBarBody>
                {t('downloadFailed')} {csv.error.message}
              </MessageBarBody>
            </MessageBar>
          ) : null}
        </ContentCard>
        <ContentCard aria-labelledby="report-species">
          <Heading level="section" id="report-species">
            {t('bySpeciesHeading')}
          </Heading>
          <BarTable
            caption={t('bySpeciesCaption')}
            words={(r) =>
              r.target === undefined
                ? plants(r.value)
                : t('plantsOfPlanned', { formatted: format.number(r.value), target: format.number(r.target) })
            }
            rows={report.bySpecies.map((s) => ({
              label: s.commonName,
              value: s.plantsGiven,
              ...(s.targetPlants === null ? {} : { target: s.targetPlants }),
            }))}
          />
        </ContentCard>
        <ContentCard aria-labelledby="report-flowering">
          <Heading level="section" id="report-flowering">
            {t('floweringHeading')}
          </Heading>
          <p className={styles.lead}>{t('floweringLead')}</p>
          <BarTable
            caption={t('floweringCaption')}
            words={(r) => plants(r.value)}
            rows={report.floweringByMonth.map((m) => ({ label: m.monthName, value: m.plants }))}
          />
        </ContentCard>
        <ContentCard aria-labelledby="report-hosts">
          <Heading level="section" id="report-hosts">
            {t('hostsHeading')}
          </Heading>
          {report.caterpillarHosts.map((h) => (
            <section key={h.layer} aria-label={t(`layer.${h.layer}`)}>
              <Heading level="card">
                {t(`layer.${h.layer}`)}: {plants(h.plants)}
              </Heading>
              <ul className={styles.list}>
                {h.words.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            </section>
          ))}
        </ContentCard>
        <ContentCard aria-labelledby="report-zips">
          <Heading level="section" id="report-zips">
            {t('zipHeading')}
          </Heading>
          <p className={styles.lead}>{t('zipLead')}</p>
          {report.zipAreas.length === 0 ? (
            <p>{t('noZips')}</p>
          ) : (
            <BarTable
              caption={t('zipCaption')}
              words={(r) => t('households_count', { count: r.value, formatted: format.number(r.value) })}
              rows={report.zipAreas.map((z) => ({ label: t('zipArea', { area: z.area }), value: z.households }))}
            />
          )}
        </ContentCard>
        <ContentCard aria-labelledby="report-germination">
          <Heading level="section" id="report-germination">
            {t('germinationHeading')}
          </Heading>
          {report.germination === null ? (
            <p className={styles.lead}>{t('germinationLater')}</p>
          ) : (
            <GerminationTables germination={report.germination} />
          )}
        </ContentCard>
      </div>
    </>
  );
}
