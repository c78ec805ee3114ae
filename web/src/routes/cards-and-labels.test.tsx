import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import {
  butterflyMilkweed,
  goldenAlexanders,
  manySpecies,
  wildBergamot,
} from '../features/cards-labels/testing/card-fixtures.js';
import { detailRoutes, fakeSpeciesSearch } from '../features/cards-labels/testing/card-api.js';
import { decodeQrSvg } from '../features/cards-labels/testing/decode-qr.js';
import { apiError } from '../testing/fake-api.js';
import { renderApp } from '../testing/render-app.js';

const three = [butterflyMilkweed, wildBergamot, goldenAlexanders];

function open(path: string, records = three, extra = {}) {
  return renderApp({ path, api: { ...detailRoutes(records), ...extra } });
}

// Four fact cards to a page (the brief: 2 × 2 per Letter or A4 sheet), so 9 species print on 3 pages.
describe('cards & labels page', () => {
  // The page is a lazy route; load its code once so the first test does not time out compiling it.
  beforeAll(async () => {
    await import('./cards-and-labels.js');
  }, 20_000);

  it('prints 9 species as 9 fact cards on 3 pages of 4, 4 and 1', async () => {
    const nine = manySpecies(9);
    open(`/cards-and-labels?species=${nine.map((s) => s.slug).join(',')}`, nine);
    const preview = await screen.findByRole('region', { name: 'Fact cards as they will print' });
    await within(preview).findByRole('article', { name: 'Butterfly milkweed' });
    const pages = within(preview).getAllByRole('group', { name: /^Page \d of 3$/ });
    expect(pages).toHaveLength(3);
    expect(pages.map((p) => within(p).getAllByRole('article').length)).toEqual([4, 4, 1]);
    expect(screen.getByText('9 fact cards on 3 pages')).toBeInTheDocument();
    expect(screen.getByText('9 species chosen')).toBeInTheDocument();
  });

  it('points each fact card’s QR code at the public address the site publishes', async () => {
    // What the API answers when PUBLIC_URL is set to the invented scenario's address.
    const publicUrl = 'https://plants.larkfield.example';
    open('/cards-and-labels?species=asclepias-tuberosa', three, { 'GET /api/site': { body: { publicUrl } } });
    const url = `${publicUrl}/species/asclepias-tuberosa`;
    const qr = await screen.findByRole('img', { name: `QR code linking to ${url}` });
    expect(decodeQrSvg(qr)).toBe(url);
  });

  it('lists the chosen species with a count, removes one, and says which slug is not in the catalogue', async () => {
    const { user, router } = open(
      '/cards-and-labels?species=asclepias-tuberosa,monarda-fistulosa,no-such-plant',
      three,
      {
        'GET /api/species/no-such-plant': apiError(404, 'No species with slug no-such-plant'),
      },
    );
    expect(await screen.findByText('3 species chosen')).toBeInTheDocument();
    expect(await screen.findByText(/“no-such-plant” is not in the catalogue/)).toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Remove wild bergamot' }));
    expect(screen.getByText('2 species chosen')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?species=asclepias-tuberosa%2Cno-such-plant');
    expect(screen.queryByRole('article', { name: 'Wild bergamot' })).toBeNull();
  });

  it('adds a species found by a misspelt search', async () => {
    const { user, router } = open('/cards-and-labels');
    const search = fakeSpeciesSearch((q) => (q === 'buterfly weed' ? [butterflyMilkweed] : []));
    expect(await screen.findByText('No species chosen yet')).toBeInTheDocument();
    await user.type(screen.getByRole('searchbox', { name: /Search the catalogue/ }), 'buterfly weed');
    await user.click(await screen.findByRole('button', { name: 'Add butterfly milkweed' }));
    expect(await screen.findByRole('article', { name: 'Butterfly milkweed' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?species=asclepias-tuberosa');
    expect(search.queries).toContain('buterfly weed');
  });

  it('resolves a pasted list line by line and lists the names it could not find', async () => {
    const { user } = open('/cards-and-labels');
    fakeSpeciesSearch((q) => ({ 'wild bergamot': [wildBergamot], 'Zizia aurea': [goldenAlexanders] })[q] ?? []);
    await screen.findByText('No species chosen yet');
    await user.type(
      screen.getByRole('textbox', { name: /Or paste a list/ }),
      '- wild bergamot{Enter}2. Zizia aurea{Enter}purple hazeweed',
    );
    await user.click(screen.getByRole('button', { name: 'Find and add these' }));
    expect(await screen.findByText('2 species chosen')).toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent(
      'Not found in the catalogue, so not added: “purple hazeweed”.',
    );
    const found = within(screen.getByRole('list', { name: 'Names found' }));
    expect(found.getByText(/“wild bergamot”: added wild bergamot/)).toBeInTheDocument();
  });

  it('switches to pot labels with the sow date, short treatment and copies per species, and prints', async () => {
    const print = vi.spyOn(window, 'print').mockImplementation(() => {});
    const { user } = open('/cards-and-labels?species=asclepias-tuberosa,monarda-fistulosa');
    await screen.findByRole('article', { name: 'Butterfly milkweed' });
    await user.click(screen.getByRole('button', { name: 'Pot labels' }));
    const date = screen.getByLabelText(/Sow date/);
    await user.clear(date);
    await user.type(date, '2026-03-02');
    const preview = await screen.findByRole('region', { name: 'Pot labels as they will print' });
    const labels = within(preview).getAllByTestId('pot-label');
    expect(labels).toHaveLength(2);
    expect(labels[0]).toHaveTextContent('Butterfly milkweed');
    expect(labels[0]).toHaveTextContent('Sown Mar 2, 2026');
    expect(labels[0]).toHaveTextContent('CMS 30 d');
    // Light, soil and height from the fixtures (card-fixtures.ts, after species-data/species/asclepias-tuberosa.json):
    // 30–75 cm is 12–30 in at 2.54 cm to the inch.
    expect(labels[0]).toHaveTextContent('full sun/part shade · dry/medium-moist');
    expect(labels[0]).toHaveTextContent('12–30 in (30–75 cm) tall');
    expect(labels[1]).toHaveTextContent('no treatment · surface sow');

    const copies = screen.getByRole('spinbutton', { name: /Labels per species/ });
    await user.clear(copies);
    await user.type(copies, '3{Enter}');
    await waitFor(() => expect(within(preview).getAllByTestId('pot-label')).toHaveLength(6));
    expect(screen.getByText('6 pot labels on 1 page')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Print pot labels' }));
    expect(print).toHaveBeenCalledTimes(1);
  });

  it('reminds about noxious-weed lists and milky sap, naming the chosen plants with cautions', async () => {
    open('/cards-and-labels?species=asclepias-tuberosa,monarda-fistulosa');
    const reminder = await screen.findByRole('complementary', { name: 'Before you plant' });
    expect(reminder).toHaveTextContent(/check your state's noxious-weed list and any local rules/);
    await within(reminder).findByText(/butterfly milkweed: irritating sap, toxic if eaten/);
    expect(reminder).toHaveTextContent(/wear gloves/);
    expect(within(reminder).queryByText(/wild bergamot/)).toBeNull();
  });

  it('adds the species of a saved mix named in the link', async () => {
    const { router } = open('/cards-and-labels?mix=4f1c2a7e-6a3b-4c1d-9e2f-0a1b2c3d4e5f', three, {
      'GET /api/mixes/4f1c2a7e-6a3b-4c1d-9e2f-0a1b2c3d4e5f': {
        body: {
          id: '4f1c2a7e-6a3b-4c1d-9e2f-0a1b2c3d4e5f',
          name: 'Larkfield front yard',
          chosen: ['zizia-aurea', 'monarda-fistulosa'],
          request: {},
          ownerFirstName: 'Priya',
          createdAt: '2026-03-01T12:00:00.000Z',
        },
      },
    });
    expect(await screen.findByRole('article', { name: 'Golden alexanders' })).toBeInTheDocument();
    expect(screen.getByText('2 species chosen')).toBeInTheDocument();
    expect(router.state.location.search).toBe('?species=zizia-aurea%2Cmonarda-fistulosa');
  });

  it('asks for a species before anything can print', async () => {
    open('/cards-and-labels');
    expect(await screen.findByRole('heading', { level: 1, name: 'Cards & labels' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Print fact cards' })).toBeDisabled();
    expect(screen.getByText('Nothing to print yet')).toBeInTheDocument();
  });
});

// Spanish words on the printed card and label: locales/es/cards.ts and the shared Spanish tables
// (from-memory); the date through Intl in es-US (CLDR). No published Spanish name: the English
// common name prints with the scientific name.
describe('cards & labels in Spanish', () => {
  beforeAll(async () => {
    await import('./cards-and-labels.js');
  }, 20_000);

  it('prints the fact card and pot label in Spanish, cautions included', async () => {
    const { user } = renderApp({
      path: '/cards-and-labels?species=asclepias-tuberosa',
      locale: 'es',
      api: detailRoutes(three),
    });
    const card = within(await screen.findByRole('article', { name: 'Butterfly milkweed' }));
    expect(card.getByText('Asclepias tuberosa')).toBeInTheDocument();
    expect(card.getByText('Florece jun–ago')).toBeInTheDocument();
    expect(card.getByText('Pleno sol o media sombra')).toBeInTheDocument();
    expect(card.getByRole('heading', { name: 'Precauciones' })).toBeInTheDocument();
    expect(card.getByText('Savia irritante:')).toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Etiquetas para macetas' }));
    const date = screen.getByLabelText(/Fecha de siembra/);
    await user.clear(date);
    await user.type(date, '2026-03-02');
    const preview = await screen.findByRole('region', { name: 'Las etiquetas como se van a imprimir' });
    const label = within(preview).getAllByTestId('pot-label')[0];
    expect(label).toHaveTextContent('Sembrada el 2 mar 2026');
    expect(label).toHaveTextContent('pleno sol/media sombra · seco/fresco');
    expect(label).toHaveTextContent('estrat. fría 30 d');
    expect(label).toHaveTextContent('12–30 in (30–75 cm) de alto');
  });
});
