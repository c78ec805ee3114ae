import { screen } from '@testing-library/react';
import type { User } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { butterflyMilkweedRecord } from '../features/species-detail/testing/species-record.js';
import { apiError } from '../testing/fake-api.js';
import { priyaMember } from '../testing/fixtures.js';
import { renderApp } from '../testing/render-app.js';

// Ines Calder is the curator of the invented demo scenario.
const ines: User = {
  id: 'u-ines',
  email: 'ines.calder@example.org',
  displayName: 'Ines Calder',
  role: 'curator',
  groups: [],
  createdAt: '2025-09-01T15:00:00.000Z',
};
const sources = [
  { key: 'from-memory', citation: 'Recalled by a curator; not re-read from a published source.' },
  { key: 'usda-plants', citation: 'USDA, NRCS. The PLANTS Database: accepted taxa and state distribution.' },
  { key: 'tallamy-shropshire-2009', citation: 'Tallamy & Shropshire (2009), Conservation Biology 23(4).' },
  { key: 'usda-plants-characteristics', citation: 'USDA, NRCS. The PLANTS Database, Characteristics tables.' },
  { key: 'xerces-milkweeds-2014', citation: 'Borders & Lee-Mäder (2014). Milkweeds: A Conservation Guide.' },
];
const { hasPhoto: _p, photoCredit: _c, ...record } = butterflyMilkweedRecord;
const allSources = [...new Set([...sources.map((s) => s.key), ...Object.values(record.sources)])].map((key) => ({
  key,
  citation: sources.find((s) => s.key === key)?.citation ?? `A published source cited as ${key}.`,
}));
const routes = (me: User) => ({
  'GET /api/me': { body: me },
  'GET /api/species/asclepias-tuberosa': { body: butterflyMilkweedRecord },
  'GET /api/species/asclepias-tuberosa/history': { body: [] },
  'GET /api/species-sources': { body: allSources },
  'PUT /api/species/asclepias-tuberosa': { body: record },
});

describe('the species editor (curators)', () => {
  it('shows sizes both ways, says a bad range beside its field and sends nothing until it is fixed', async () => {
    const { user, api } = renderApp({ path: '/species/asclepias-tuberosa/edit', token: 'ines', api: routes(ines) });
    const max = await screen.findByRole('textbox', { name: /Height to \(cm\)/ }, { timeout: 5000 });
    // 30–75 cm is 12–30 in (1 in = 2.54 cm, the international inch).
    expect(screen.getByText(`Height: 12–30 in (30–75 cm)`)).toBeInTheDocument();
    await user.clear(max);
    await user.type(max, '10');
    expect(screen.getByText('Type both numbers to see the range in feet and inches.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));
    expect(await screen.findByText('Min must not exceed max')).toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.clear(max);
    await user.type(max, '90');
    expect(screen.getByText('Height: 1–3 ft (30–90 cm)')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));
    // The form is large; under a busy CPU the save and the page after it take a while.
    await screen.findByRole('heading', { level: 1, name: 'Butterfly milkweed' }, { timeout: 15000 });
    const put = api.calls.find((c) => c.method === 'PUT');
    expect(put?.body).toMatchObject({ slug: 'asclepias-tuberosa', heightCm: { min: 30, max: 90 } });
    expect((put?.body as { sources: Record<string, string> }).sources).toEqual(record.sources);
    // The whole record's form re-renders on each keystroke; jsdom is slow at that, so this test gets longer.
  }, 45_000);

  it('shows an API refusal beside the field it names, not only above the form', async () => {
    const { user } = renderApp({
      path: '/species/asclepias-tuberosa/edit',
      token: 'ines',
      api: {
        ...routes(ines),
        'PUT /api/species/asclepias-tuberosa': apiError(400, 'Please check: sources.heightCm', {
          fields: [{ field: 'sources.heightCm', message: '"old-notes" is not in the sources registry' }],
        }),
      },
    });
    await user.click(await screen.findByRole('button', { name: 'Save the changes' }, { timeout: 15000 }));
    const picker = await screen.findByRole('combobox', { name: /Source for the height/ }, { timeout: 15000 });
    expect(picker).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('"old-notes" is not in the sources registry')).toBeInTheDocument();
  }, 45_000);

  it('edits cautions as entries (kind, sentence, source) and sends them as the record’s list', async () => {
    const { user, api } = renderApp({ path: '/species/asclepias-tuberosa/edit', token: 'ines', api: routes(ines) });
    const n = record.cautions.length + 1;
    await user.click(await screen.findByRole('button', { name: 'Add a caution' }, { timeout: 15000 }));
    // A sentence under 10 characters is refused by the shared schema beside the list, and nothing is sent.
    await user.type(screen.getByRole('textbox', { name: `Caution ${n}: what to say` }), 'Gloves.');
    await user.click(screen.getByRole('combobox', { name: `Caution ${n}: source` }));
    await user.click(await screen.findByRole('option', { name: /From memory/ }));
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));
    expect(
      await screen.findByText(`Entry ${n}, text: Must be at least 10 characters`, {}, { timeout: 15000 }),
    ).toBeInTheDocument();
    expect(api.calls.some((c) => c.method === 'PUT')).toBe(false);

    await user.type(screen.getByRole('textbox', { name: `Caution ${n}: what to say` }), ' Wear them to cut stems.');
    await user.click(screen.getByRole('button', { name: 'Remove caution 1' }));
    await user.click(screen.getByRole('button', { name: 'Save the changes' }));
    await screen.findByRole('heading', { level: 1, name: 'Butterfly milkweed' }, { timeout: 15000 });
    const put = api.calls.find((c) => c.method === 'PUT');
    expect((put?.body as { cautions: unknown[] }).cautions).toEqual([
      ...record.cautions.slice(1),
      { kind: 'toxic-if-eaten', text: 'Gloves. Wear them to cut stems.', source: 'from-memory' },
    ]);
  }, 60_000);

  it('tells a member the page is for curators and loads no form', async () => {
    renderApp({ path: '/species/asclepias-tuberosa/edit', token: 'priya', api: routes(priyaMember) });
    expect(await screen.findByText('Adding and editing species is for curators.', {}, { timeout: 5000 })).toBeVisible();
    expect(screen.queryByRole('button', { name: 'Save the changes' })).toBeNull();
  });
});
