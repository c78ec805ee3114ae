import { screen, within } from '@testing-library/react';
import type { UnexplainedDisagreements, User } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
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
// The reference value is USDA PLANTS' mature height for ASTU (usda_plants_characteristics.csv: 2 ft).
const unexplained: UnexplainedDisagreements = {
  available: true,
  missingFiles: [],
  compared: 503,
  count: 1,
  records: [
    {
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      commonName: 'butterfly milkweed',
      checks: [
        {
          field: 'heightCm',
          file: 'usda_plants_characteristics.csv',
          source: 'usda-plants-characteristics',
          record: '300–400 cm',
          reference: '2 ft (61 cm) at maturity',
          verdict: 'differs',
          rule: "USDA's mature height within the record's range widened by a fifth each way",
          reconciliation: null,
        },
      ],
    },
  ],
};

describe('the reference page (curators)', () => {
  it('counts the unexplained differences and shows each beside the reference, naming the file and source', async () => {
    renderApp({
      path: '/reference-checks',
      token: 'ines',
      api: { 'GET /api/me': { body: ines }, 'GET /api/reference-checks': { body: unexplained } },
    });
    expect(
      await screen.findByText('1 difference not yet explained, across 1 of 503 records.', {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    const row = within(screen.getByRole('row', { name: /Height/ }));
    expect(row.getByText('300–400 cm')).toBeInTheDocument();
    expect(
      row.getByText(/From usda_plants_characteristics\.csv \(source “usda-plants-characteristics”\)/),
    ).toBeInTheDocument();
    expect(row.getByText('Differs')).toBeInTheDocument();
    expect(row.getByText('No note')).toBeInTheDocument();
  });

  it('says which reference files are missing instead of comparing', async () => {
    renderApp({
      path: '/reference-checks',
      token: 'ines',
      api: {
        'GET /api/me': { body: ines },
        'GET /api/reference-checks': {
          body: { available: false, missingFiles: ['usda_plants_taxa.csv'], compared: 0, count: 0, records: [] },
        },
      },
    });
    expect(await screen.findByText('The reference files are not here', {}, { timeout: 5000 })).toBeInTheDocument();
    expect(screen.getByText(/found none of: usda_plants_taxa\.csv/)).toBeInTheDocument();
  });

  it('tells a member the page is for curators, without asking for the comparison', async () => {
    const { api } = renderApp({
      path: '/reference-checks',
      token: 'priya',
      api: { 'GET /api/me': { body: priyaMember } },
    });
    expect(await screen.findByText('This page is for curators.', {}, { timeout: 5000 })).toBeInTheDocument();
    expect(api.calls.some((c) => c.path === '/api/reference-checks')).toBe(false);
  });
});
