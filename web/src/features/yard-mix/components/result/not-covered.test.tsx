import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '../../../../testing/render-app.js';
import { driftlessEcoregion, FIXTURE_MIX_PATH, fixtureMix } from '../../testing/mix-fixtures.js';

// The answer for a region the catalogue does not cover (the engine's words, as coverage.ts gives
// them for the Sonoran Desert): it must say so and offer the way back to the ground step.
const MESSAGE =
  "Homeground's catalogue holds native plants of the eastern and central United States and does not cover your ecoregion (EPA Level III 81) yet.";

function notCoveredMix() {
  const mix = fixtureMix();
  return { ...mix, palette: { ...mix.palette, chosen: [], coverage: { covered: false, message: MESSAGE } } };
}

describe('a region the catalogue does not cover', { timeout: 30_000 }, () => {
  it('says so, and "Change your ground" goes back to the ground step with the yard answers kept', async () => {
    const { user, router } = renderApp({
      path: FIXTURE_MIX_PATH,
      api: {
        'POST /api/mixes/balance': { body: notCoveredMix() },
        'GET /api/ecoregions/52': { body: driftlessEcoregion },
      },
    });
    expect(await screen.findByText('Homeground does not cover this region yet', {}, { timeout: 5000 })).toBeVisible();
    expect(screen.getByText(MESSAGE)).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();

    await user.click(screen.getByRole('button', { name: 'Change your ground' }));
    const params = new URLSearchParams(router.state.location.search);
    expect(params.get('step')).toBe('ground');
    expect(params.get('area')).toBe('200');
    expect(await screen.findByRole('heading', { name: 'Step 1 of 3: your ground' })).toBeInTheDocument();
    expect(screen.queryByText('Homeground does not cover this region yet')).toBeNull();
  });
});
