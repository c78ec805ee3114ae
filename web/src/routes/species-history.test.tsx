import { screen, within } from '@testing-library/react';
import type { SpeciesChange, User } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { butterflyMilkweedRecord } from '../features/species-detail/testing/species-record.js';
import { priyaMember } from '../testing/fixtures.js';
import { renderApp } from '../testing/render-app.js';

// Ines Calder is the curator of the invented demo scenario (shared/DESIGN.md beside the project).
const ines: User = {
  id: 'u-ines',
  email: 'ines.calder@example.org',
  displayName: 'Ines Calder',
  role: 'curator',
  groups: [],
  createdAt: '2025-09-01T15:00:00.000Z',
};
const edit: SpeciesChange = {
  id: '6f1c1d52-8d0e-4f57-9a51-0c9f3c1e2a01',
  slug: 'asclepias-tuberosa',
  kind: 'import',
  changedAt: '2026-11-30T14:05:00.000Z',
  changedBy: { id: 'u-ines', displayName: 'Ines Calder' },
  fileName: 'spring-edits.csv',
  revertOf: null,
  changes: [{ field: 'heightCm', before: '{"min":30,"max":75}', after: '{"min":30,"max":90}', source: 'usda-plants' }],
};
const routes = (me: User) => ({
  'GET /api/me': { body: me },
  'GET /api/species/asclepias-tuberosa': { body: butterflyMilkweedRecord },
  'GET /api/species/asclepias-tuberosa/history': { body: [edit] },
  [`POST /api/species/asclepias-tuberosa/history/${edit.id}/revert`]: { body: butterflyMilkweedRecord },
});

describe("a species record's history (curators)", () => {
  it('shows who changed which field, from which file, with the source, and undoes a change after asking', async () => {
    const { user, api } = renderApp({ path: '/species/asclepias-tuberosa', token: 'ines', api: routes(ines) });
    const panel = within(await screen.findByRole('region', { name: 'Changes to this record' }, { timeout: 5000 }));
    expect(
      await panel.findByText(/^Imported by Ines Calder on .* \(from spring-edits\.csv\)$/, {}, { timeout: 5000 }),
    ).toBeInTheDocument();
    expect(panel.getByText('heightCm')).toBeInTheDocument();
    expect(panel.getByText(/\{"min":30,"max":75\} → \{"min":30,"max":90\}/)).toBeInTheDocument();
    expect(panel.getByText(/source: usda-plants/)).toBeInTheDocument();

    await user.click(panel.getByRole('button', { name: 'Undo this change' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Undo this change?' }, { timeout: 5000 }));
    await user.click(dialog.getByRole('button', { name: 'Undo' }));
    await screen.findByRole('region', { name: 'Changes to this record' });
    expect(api.calls.find((c) => c.method === 'POST')).toMatchObject({
      path: `/api/species/asclepias-tuberosa/history/${edit.id}/revert`,
      body: {},
    });
  });

  it('is not shown to a member, who never asks for it', async () => {
    const { api } = renderApp({ path: '/species/asclepias-tuberosa', token: 'priya', api: routes(priyaMember) });
    await screen.findByRole('heading', { level: 1, name: 'Butterfly milkweed' }, { timeout: 5000 });
    expect(screen.queryByRole('region', { name: 'Changes to this record' })).toBeNull();
    expect(api.calls.some((c) => c.path.endsWith('/history'))).toBe(false);
  });

  it('speaks Spanish on a Spanish page: the heading, the change and its date', async () => {
    renderApp({ path: '/species/asclepias-tuberosa', token: 'ines', api: routes(ines), locale: 'es' });
    const panel = within(await screen.findByRole('region', { name: 'Cambios en esta ficha' }, { timeout: 5000 }));
    // Spanish dates put the day first with a lower-case month ("30 nov 2026").
    expect(
      await panel.findByText(
        /^Importada por Ines Calder el 30 nov 2026.* \(desde spring-edits\.csv\)$/,
        {},
        { timeout: 5000 },
      ),
    ).toBeInTheDocument();
    expect(panel.getByRole('button', { name: 'Deshacer este cambio' })).toBeInTheDocument();
  });
});
