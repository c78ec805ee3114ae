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
import { REPORT_WORDS as W } from '../utils/report-words.js';
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
  return (
    <QueryState
      query={report}
      loading={W.loading}
      error={(error, retry) =>
        isApiRequestError(error) && error.statusCode === 404 ? (
          <EmptyState title={W.noShare} />
        ) : (
          <ErrorState title={W.loadFailed} message={error.message} onRetry={retry} />
        )
      }
    >
      {(r) => <Report report={r} />}
    </QueryState>
  );
}

function longDate(day: string): string {
  return new Intl.DateTimeFormat('en-US', { month: 'long', day: 'numeric', year: 'numeric', timeZone: 'UTC' }).format(
    new Date(`${day}T00:00:00Z`),
  );
}

function Report({ report }: { report: ShareReport }) {
  const styles = useStyles();
  const t = report.totals;
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
    [t.plantsGiven, W.plantsGiven],
    [t.households, `${W.households} (${t.walkUps} ${W.walkUps})`],
    [t.milkweedPlants, W.milkweeds],
    [t.species, W.species],
  ];
  return (
    <>
      <PageIntro title={W.title(report.seasonYear)}>{W.lead(report.groupName, longDate(report.shareDate))}</PageIntro>
      <div className={styles.stack}>
        <ContentCard aria-labelledby="report-impact">
          <Heading level="section" id="report-impact">
            {W.impactHeading}
          </Heading>
          <ul className={styles.figures} aria-label={W.figures}>
            {figures.map(([n, label]) => (
              <li key={label} className={styles.figure}>
                <span className={styles.number}>{n.toLocaleString('en-US')}</span>{' '}
                <span className={styles.label}>{label}</span>
              </li>
            ))}
          </ul>
          <p>
            {t.shareOfTargets === null ? W.noTargets : W.ofTargets(Math.round(t.shareOfTargets * 100), t.targetPlants)}
          </p>
          <ul className={styles.list}>
            {report.summary.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          <div className={styles.actions} data-print="hide">
            <Button icon={<ArrowDownloadRegular />} onClick={() => csv.mutate()} disabled={csv.isPending}>
              {W.csv}
            </Button>
            <Button icon={<PrintRegular />} onClick={() => window.print()}>
              {W.print}
            </Button>
          </div>
          {csv.isError ? (
            <MessageBar intent="error">
              <MessageBarBody>
                {W.downloadFailed} {csv.error.message}
              </MessageBarBody>
            </MessageBar>
          ) : null}
        </ContentCard>
        <ContentCard aria-labelledby="report-species">
          <Heading level="section" id="report-species">
            {W.bySpeciesHeading}
          </Heading>
          <BarTable
            caption={W.bySpeciesCaption}
            unit={W.plantsUnit}
            rows={report.bySpecies.map((s) => ({
              label: s.commonName,
              value: s.plantsGiven,
              ...(s.targetPlants === null ? {} : { target: s.targetPlants }),
            }))}
          />
        </ContentCard>
        <ContentCard aria-labelledby="report-flowering">
          <Heading level="section" id="report-flowering">
            {W.floweringHeading}
          </Heading>
          <p className={styles.lead}>{W.floweringLead}</p>
          <BarTable
            caption={W.floweringCaption}
            unit={W.plantsUnit}
            rows={report.floweringByMonth.map((m) => ({ label: m.monthName, value: m.plants }))}
          />
        </ContentCard>
        <ContentCard aria-labelledby="report-hosts">
          <Heading level="section" id="report-hosts">
            {W.hostsHeading}
          </Heading>
          {report.caterpillarHosts.map((h) => (
            <section key={h.layer} aria-label={W.layer[h.layer]}>
              <Heading level="card">
                {W.layer[h.layer]}: {W.layerPlants(h.plants)}
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
            {W.zipHeading}
          </Heading>
          <p className={styles.lead}>{W.zipLead}</p>
          {report.zipAreas.length === 0 ? (
            <p>{W.noZips}</p>
          ) : (
            <BarTable
              caption={W.zipCaption}
              unit={W.householdsUnit}
              rows={report.zipAreas.map((z) => ({ label: W.zipArea(z.area), value: z.households }))}
            />
          )}
        </ContentCard>
        <ContentCard aria-labelledby="report-germination">
          <Heading level="section" id="report-germination">
            {W.germinationHeading}
          </Heading>
          {report.germination === null ? (
            <p className={styles.lead}>{W.germinationLater}</p>
          ) : (
            <GerminationTables germination={report.germination} />
          )}
        </ContentCard>
      </div>
    </>
  );
}
