import type { ShareReport } from '@homeground/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { maraOrganiser } from '../../../testing/fixtures.js';
import { renderApp } from '../../../testing/render-app.js';

// The invented demo group's season report (shared/DESIGN.md beside the project, "Demo scenario"),
// counts made up for the test. Caterpillar host words follow the shared report, which judges host
// value within the layer after Tallamy & Shropshire 2009 (Solidago 115 genera among herbaceous plants).
const REPORT_PATH = '/api/groups/larkfield-commons-growers/plant-share/report';

const report: ShareReport = {
  groupSlug: 'larkfield-commons-growers',
  groupName: 'Larkfield Commons Growers',
  seasonYear: 2027,
  shareDate: '2027-06-12',
  totals: {
    plantsGiven: 130,
    households: 24,
    walkUps: 4,
    milkweedPlants: 50,
    species: 3,
    targetPlants: 200,
    shareOfTargets: 0.65,
  },
  bySpecies: [
    {
      speciesSlug: 'asclepias-tuberosa',
      commonName: 'butterfly milkweed',
      scientificName: 'Asclepias tuberosa',
      layer: 'herbaceous',
      isMilkweed: true,
      plantsGiven: 50,
      targetPlants: 60,
    },
    {
      speciesSlug: 'solidago-speciosa',
      commonName: 'showy goldenrod',
      scientificName: 'Solidago speciosa',
      layer: 'herbaceous',
      isMilkweed: false,
      plantsGiven: 45,
      targetPlants: 80,
    },
    {
      speciesSlug: 'monarda-fistulosa',
      commonName: 'wild bergamot',
      scientificName: 'Monarda fistulosa',
      layer: 'herbaceous',
      isMilkweed: false,
      plantsGiven: 35,
      targetPlants: 60,
    },
  ],
  floweringByMonth: Array.from({ length: 12 }, (_, i) => ({
    month: i + 1,
    monthName: ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'][i],
    species: [6, 7, 8].includes(i + 1) ? 2 : 0,
    plants: [6, 7, 8].includes(i + 1) ? 85 : 0,
  })),
  caterpillarHosts: [
    {
      layer: 'herbaceous',
      plants: 130,
      words: ['45 plants are among the best caterpillar host plants of the wildflowers, grasses and ferns.'],
    },
  ],
  zipAreas: [
    { area: '546', households: 20 },
    { area: '536', households: 4 },
  ],
  germination: null,
  summary: ['The share gave 130 native plants to 24 households.'],
};

describe('the season report', () => {
  it('shows the figures, the charts as tables with their numbers, and counts only', async () => {
    renderApp({
      path: '/plant-share/report',
      token: 'token',
      api: { 'GET /api/me': { body: maraOrganiser }, [`GET ${REPORT_PATH}`]: { body: report } },
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Season report 2027' })).toBeInTheDocument();
    const figures = within(screen.getByRole('list', { name: 'Figures' }));
    expect(figures.getByText('130')).toBeInTheDocument();
    expect(screen.getByText('65% of the season’s target of 200 plants')).toBeInTheDocument();
    expect(screen.getByText('The share gave 130 native plants to 24 households.')).toBeInTheDocument();

    const species = within(screen.getByRole('table', { name: /Plants given by species/ }));
    expect(
      within(species.getByRole('rowheader', { name: 'butterfly milkweed' }).closest('tr')!).getByText(
        '50 plants of 60 planned',
      ),
    ).toBeInTheDocument();
    const months = within(screen.getByRole('table', { name: /in flower, by month/ }));
    expect(months.getAllByRole('row')).toHaveLength(12);
    expect(screen.getByText(/among the best caterpillar host plants/)).toBeInTheDocument();
    const zips = within(screen.getByRole('table', { name: 'Households by ZIP area' }));
    expect(zips.getByText('ZIP area 546xx')).toBeInTheDocument();
    expect(zips.getByText('20 households')).toBeInTheDocument();
    expect(screen.getByText(/once the growers’ batch logs are recorded/)).toBeInTheDocument();
    // Counts only: no e-mail address or raw score anywhere on the page.
    expect(document.body.textContent).not.toMatch(/@|score/i);
  });

  it('shows germination by method and by grower as tables first, then plants ready as bars', async () => {
    // Invented counts (demo scenario): the page shows what the API sums from the batch logs.
    renderApp({
      path: '/plant-share/report',
      token: 'token',
      api: {
        'GET /api/me': { body: maraOrganiser },
        [`GET ${REPORT_PATH}`]: {
          body: {
            ...report,
            germination: {
              byMethod: [
                { method: 'winter-sowing', sown: 120, germinated: 70, ready: 50 },
                { method: 'soil-blocks', sown: 40, germinated: 30, ready: 24 },
              ],
              byGrower: [
                { grower: 'Juniper', sown: 120, germinated: 70, ready: 50 },
                { grower: 'Theo', sown: 40, germinated: 30, ready: 24 },
              ],
            },
          },
        },
      },
    });
    const byMethod = within(
      await screen.findByRole('table', { name: /^Seeds sown, seedlings up and plants ready, by method/ }),
    );
    const winter = within(
      byMethod.getByRole('rowheader', { name: 'Winter sowing in covered containers' }).closest('tr')!,
    );
    expect(winter.getAllByRole('cell').map((c) => c.textContent)).toEqual(['120', '70', '50']);
    const byGrower = within(screen.getByRole('table', { name: /by grower/ }));
    expect(byGrower.getByRole('rowheader', { name: 'Theo' })).toBeInTheDocument();
    const bars = within(screen.getByRole('table', { name: 'Plants ready, by method' }));
    expect(bars.getByText('24 plants ready')).toBeInTheDocument();
    expect(screen.queryByText(/once the growers’ batch logs are recorded/)).not.toBeInTheDocument();
  });

  it('speaks Spanish with the page, numbers in the Spanish way', async () => {
    renderApp({
      path: '/plant-share/report',
      token: 'token',
      locale: 'es',
      api: { 'GET /api/me': { body: maraOrganiser }, [`GET ${REPORT_PATH}`]: { body: report } },
    });
    expect(await screen.findByRole('heading', { level: 1, name: 'Informe de la temporada 2027' })).toBeInTheDocument();
    expect(screen.getByText(/de la meta de la temporada, 200 plantas/)).toBeInTheDocument();
    const zips = within(screen.getByRole('table', { name: 'Hogares por zona postal' }));
    expect(zips.getByText('20 hogares')).toBeInTheDocument();
  });

  it('downloads the CSV with the sign-in token', async () => {
    const createObjectURL = vi.fn(() => 'blob:report');
    // jsdom has no object URLs; a stand-in URL class keeps the real one untouched for other tests.
    vi.stubGlobal('URL', Object.assign(class extends URL {}, { createObjectURL, revokeObjectURL: vi.fn() }));
    const { user, api } = renderApp({
      path: '/plant-share/report',
      token: 'token',
      api: {
        'GET /api/me': { body: maraOrganiser },
        [`GET ${REPORT_PATH}`]: { body: report },
        [`GET ${REPORT_PATH}.csv`]: { body: 'section,item' },
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Download the report (CSV)' }));
    await vi.waitFor(() => expect(createObjectURL).toHaveBeenCalledTimes(1));
    expect(api.callsTo('GET', `${REPORT_PATH}.csv`)[0].headers.authorization).toBe('Bearer token');
  });
});
