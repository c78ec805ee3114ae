import { screen } from '@testing-library/react';
import type { User } from '@homeground/shared';
import { describe, expect, it } from 'vitest';
import { apiError } from '../testing/fake-api.js';
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
const preview = {
  created: 1,
  updated: 1,
  dryRun: true,
  preview: [
    {
      line: 2,
      slug: 'asclepias-tuberosa',
      scientificName: 'Asclepias tuberosa',
      action: 'change',
      fields: ['heightCm'],
    },
    { line: 3, slug: 'zizia-aurea', scientificName: 'Zizia aurea', action: 'create', fields: [] },
  ],
};
const csv = () => new File(['slug,scientificName\n'], 'spring-edits.csv', { type: 'text/csv' });

describe('importing species on screen (curators)', () => {
  it('previews what the file would add and change, then imports only when asked', async () => {
    const { user, api } = renderApp({
      path: '/species/import',
      token: 'ines',
      api: {
        'GET /api/me': { body: ines },
        'POST /api/species/import': (req) =>
          req.search === '?dryRun=true' ? { body: preview } : { body: { ...preview, dryRun: false } },
      },
    });
    const input = await screen.findByLabelText(/CSV file/, {}, { timeout: 5000 });
    await user.upload(input as HTMLInputElement, csv());
    await user.click(screen.getByRole('button', { name: 'Check the file' }));
    expect(await screen.findByText('Adds 1, changes 1, leaves 0 as they are.')).toBeInTheDocument();
    expect(screen.getByRole('row', { name: /2 Asclepias tuberosa .* Changed heightCm/ })).toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'POST').map((c) => c.search)).toEqual(['?dryRun=true']);

    await user.click(screen.getByRole('button', { name: 'Import 2 species' }));
    expect(await screen.findByText(/Added 1 and updated 1 species/)).toBeInTheDocument();
    expect(api.calls.filter((c) => c.method === 'POST').map((c) => c.search)).toEqual(['?dryRun=true', '']);
  });

  it('lists each bad row with its line number and offers no import', async () => {
    renderApp({
      path: '/species/import',
      token: 'ines',
      api: {
        'GET /api/me': { body: ines },
        'POST /api/species/import': apiError(400, 'The file has 1 problem(s); nothing was imported.', {
          fields: [{ field: 'heightMaxCm', message: 'see rows' }],
          rows: [{ row: 3, field: 'heightMaxCm', message: 'Invalid input: expected number, received NaN' }],
        }),
      },
    });
    const input = await screen.findByLabelText(/CSV file/, {}, { timeout: 5000 });
    await user_upload(input as HTMLInputElement);
    expect(await screen.findByText('1 problem in the file.')).toBeInTheDocument();
    expect(screen.getByRole('row', { name: /3 heightMaxCm Invalid input/ })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /^Import/ })).toBeNull();
  });
});

async function user_upload(input: HTMLInputElement) {
  const { default: userEvent } = await import('@testing-library/user-event');
  const user = userEvent.setup();
  await user.upload(input, csv());
  await user.click(screen.getByRole('button', { name: 'Check the file' }));
}
