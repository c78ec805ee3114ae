import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { apiError } from '../../../testing/fake-api.js';
import { renderApp } from '../../../testing/render-app.js';
import { butterflyMilkweedRecord } from '../testing/species-record.js';

function openDetail(path = '/species/asclepias-tuberosa') {
  return renderApp({ path, api: { 'GET /api/species/asclepias-tuberosa': { body: butterflyMilkweedRecord } } });
}

const section = (name: string) => screen.getByRole('region', { name });
/** The first render loads the page's lazy chunk; under a busy parallel test run that can pass 1 s. */
const FIRST_PAINT = { timeout: 5000 };

// Every value below is in species-data/species/asclepias-tuberosa.json; short citations are the
// keys of species-data/sources.json.
describe('species page', () => {
  it('shows the names, the drawn placeholder and the one primary action', async () => {
    openDetail();
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Butterfly milkweed' }, FIRST_PAINT),
    ).toBeInTheDocument();
    expect(screen.getByText('Asclepias tuberosa')).toBeInTheDocument();
    expect(screen.getByText('butterfly weed, orange milkweed')).toBeInTheDocument();
    expect(screen.getByText('Asclepias decumbens')).toBeInTheDocument();
    expect(screen.getByText('ASTU')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Drawing of a flowering plant with orange flowers' })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Blooms Jun–Aug; orange flowers' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Make fact card' })).toHaveAttribute(
      'href',
      '/cards-and-labels?species=asclepias-tuberosa',
    );
    // The title is set in an effect after the heading paints; on a busy machine that is a tick later.
    await waitFor(() => expect(document.title).toBe('Butterfly milkweed · Homeground'));
  });

  it('puts the cautions up front with their sources and the noxious-weed reminder', async () => {
    openDetail();
    await screen.findByRole('heading', { level: 1 }, FIRST_PAINT);
    const cautions = section('Cautions');
    expect(within(cautions).getByText(/Milky sap can injure the eye/)).toBeInTheDocument();
    expect(within(cautions).getByText('Source: UF/IFAS Extension 2019')).toBeInTheDocument();
    expect(within(cautions).getByText(/Tropical milkweed/)).toBeInTheDocument();
    expect(within(cautions).getByText(/check your state's noxious-weed list/)).toBeInTheDocument();
  });

  it('explains germination in plain words, with depth in mm and inches and the methods that suit it', async () => {
    openDetail();
    await screen.findByRole('heading', { level: 1 }, FIRST_PAINT);
    const seed = section('Growing from seed');
    expect(within(seed).getByText('Cold-moist stratification, 30 days')).toBeInTheDocument();
    expect(within(seed).getByText(/refrigerator, not the freezer, for 30 days/)).toBeInTheDocument();
    expect(within(seed).getByText(/Chill damp, never dry/)).toBeInTheDocument();
    expect(within(seed).getByText('Sow 6 mm (¼ in) deep.')).toBeInTheDocument();
    expect(
      within(seed).getByText(/about 60% after treatment; there are about 70,000 seeds in a pound \(154 per gram\)/),
    ).toBeInTheDocument();
    expect(within(seed).getByText('Winter sowing in covered containers').parentElement).toHaveTextContent('suits it');
    expect(within(seed).getByText('Soil blocks').parentElement).toHaveTextContent('not the best way');
    expect(
      within(seed).getByText(/Borders & Lee-Mäder 2014 \(Xerces Society\) \(seed treatment\)/),
    ).toBeInTheDocument();
  });

  it('gives wildlife value with its citation, sizes in both units and the native range', async () => {
    openDetail();
    await screen.findByRole('heading', { level: 1 }, FIRST_PAINT);
    expect(
      within(section('Wildlife value')).getByText(
        'Hosts the caterpillars of a few moths and butterflies — Tallamy & Shropshire 2009.',
      ),
    ).toBeInTheDocument();
    expect(within(section('Wildlife value')).getByText(/Monarch host plant/)).toBeInTheDocument();
    const size = section('Size and habit');
    expect(within(size).getByText('12–30 in (30–75 cm)')).toBeInTheDocument();
    expect(within(size).getByText(/a curator’s recall, not yet checked/)).toBeInTheDocument();
    expect(
      within(section('Native range')).getByText(/Native to 42 of the 48 conterminous states and DC/),
    ).toBeInTheDocument();
    expect(within(section('Native range')).getByText(/Wisconsin/)).toBeInTheDocument();
  });

  it('says plainly when the catalogue has no such species', async () => {
    renderApp({
      path: '/species/no-such-plant',
      api: { 'GET /api/species/no-such-plant': apiError(404, 'No species "no-such-plant" in the catalogue.') },
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Species not found' }, FIRST_PAINT),
    ).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Search all species' })).toHaveAttribute('href', '/species');
  });

  it('explains other failures in words and retries', async () => {
    const { user, api } = renderApp({
      path: '/species/asclepias-tuberosa',
      api: { 'GET /api/species/asclepias-tuberosa': apiError(503, 'The catalogue is being updated') },
    });
    const alert = await screen.findByRole('alert', {}, FIRST_PAINT);
    expect(alert).toHaveTextContent('This species did not load.');
    await user.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(api.callsTo('GET', '/api/species/asclepias-tuberosa').length).toBeGreaterThanOrEqual(2);
  });
});

// Spanish words: this project's catalogues (locales/es/detail.ts) and the shared Spanish word tables
// (shared/src/vocabulary/locale/spanish-words.ts), from-memory. The common name stays English with the
// scientific name: the catalogue has no published Spanish name for butterfly milkweed.
describe('species page in Spanish', () => {
  it('says the facts and cautions in Spanish and keeps the English common name with the scientific one', async () => {
    renderApp({
      path: '/species/asclepias-tuberosa',
      locale: 'es',
      api: { 'GET /api/species/asclepias-tuberosa': { body: butterflyMilkweedRecord } },
    });
    expect(
      await screen.findByRole('heading', { level: 1, name: 'Butterfly milkweed' }, FIRST_PAINT),
    ).toBeInTheDocument();
    expect(screen.getByText('Asclepias tuberosa')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: 'Florece jun–ago; flores de color naranja' })).toBeInTheDocument();
    const cautions = section('Precauciones');
    expect(within(cautions).getByText('Savia irritante.')).toBeInTheDocument();
    expect(cautions).toHaveTextContent('Su savia puede irritar la piel y los ojos.');
    expect(within(section('Dónde crece')).getByText('Pleno sol o media sombra')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Hacer la ficha' })).toBeInTheDocument();
  });
});
