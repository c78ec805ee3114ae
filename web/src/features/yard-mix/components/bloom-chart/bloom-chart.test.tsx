import { FluentProvider } from '@fluentui/react-components';
import { render, screen, within } from '@testing-library/react';
import { wordsFor } from '@homeground/shared';
import { I18nextProvider } from 'react-i18next';
import { describe, expect, it } from 'vitest';
import { createI18n } from '../../../../lib/i18n/index.js';
import { homegroundTheme } from '../../../../theme/index.js';
import { fixtureSpecies } from '../../testing/mix-fixtures.js';
import { BloomChart } from './bloom-chart.js';
import { describeGaps, monthlyBloom } from '../../utils/bloom-gaps.js';

// Bloom months come from the hand-built fixture (testing/mix-fixtures.ts): no flowering species
// blooms in September; only the sedge, which CP42 does not count as a flowering species, does.
// The April–October window and the threshold of 3 are CP42's (CP42-IN, shared bloom-periods.ts).

describe('bloom gaps', () => {
  it('marks a month of the CP42 season with fewer than 3 flowering species as a gap', () => {
    const months = monthlyBloom(fixtureSpecies);
    expect(months[8]).toMatchObject({ month: 9, inBloom: [], isGap: true });
    expect(months[5]).toMatchObject({ month: 6, isGap: false });
    expect(months[5].inBloom).toHaveLength(3);
    // Outside April–October nothing is a gap, even with no flowers.
    expect(months[0]).toMatchObject({ month: 1, isGap: false });
  });

  it('says there are no gaps when every season month has 3 in flower', () => {
    const allSeason = ['a', 'b', 'c'].map((slug) => ({
      ...fixtureSpecies[0],
      slug,
      commonName: slug,
      bloomMonths: [4, 5, 6, 7, 8, 9, 10],
    }));
    expect(describeGaps(monthlyBloom(allSeason), createI18n('en').getFixedT('en', 'mix'), wordsFor('en'))).toBe(
      'No gaps: every month from April to October has at least 3 species in flower.',
    );
  });
  // Spanish words from the es catalogue (locales/es/mix.ts) and the shared Spanish month names.
  it('says the gaps in Spanish for a Spanish page', () => {
    expect(describeGaps(monthlyBloom(fixtureSpecies), createI18n('es').getFixedT('es', 'mix'), wordsFor('es'))).toMatch(
      /^\d+ huecos? de abril a octubre, cuando florecen menos de 3 especies: .*en septiembre no florece ninguna especie/,
    );
  });
});

describe('BloomChart', () => {
  it('shows September as a gap in the chart and in the text summary', () => {
    render(
      <FluentProvider theme={homegroundTheme}>
        <BloomChart species={fixtureSpecies} />
      </FluentProvider>,
    );
    const table = screen.getByRole('table', { name: /bloom chart/i });
    expect(within(table).getByRole('columnheader', { name: 'September, gap' })).toBeInTheDocument();
    expect(within(table).getByRole('columnheader', { name: 'June' })).toBeInTheDocument();

    const summary = screen.getByTestId('bloom-gap-summary');
    expect(summary).toHaveTextContent('September has no species in flower');
    expect(summary).not.toHaveTextContent('June');

    // Colour is never the only cue: each bloom cell says its colour in words and shows a label.
    const phlox = within(table).getByRole('row', { name: /early test phlox/ });
    expect(within(phlox).getAllByText('in flower, lavender')).toHaveLength(4);
    expect(within(phlox).getAllByText('Lv')).toHaveLength(4);
    expect(screen.getByRole('list', { name: 'Bloom chart legend' })).toHaveTextContent('Lv: lavender');
    // The sedge is drawn but not counted toward flowering.
    expect(within(table).getByRole('row', { name: /test sedge/ })).toHaveTextContent('not counted');
  });

  // Spanish words from the es catalogue (locales/es/mix.ts) and the shared Spanish colour names.
  it('labels the bloom cells and the legend in Spanish for a Spanish page', () => {
    render(
      <I18nextProvider i18n={createI18n('es')}>
        <FluentProvider theme={homegroundTheme}>
          <BloomChart species={fixtureSpecies} />
        </FluentProvider>
      </I18nextProvider>,
    );
    const table = screen.getByRole('table', { name: /calendario de floración/i });
    const phlox = within(table).getByRole('row', { name: /early test phlox/ });
    expect(within(phlox).getAllByText('en flor, lavanda')).toHaveLength(4);
    expect(within(phlox).getAllByText('Lv')).toHaveLength(4);
    const legend = screen.getByRole('list', { name: /leyenda/i });
    expect(legend).toHaveTextContent('Am: amarillo');
    expect(legend).toHaveTextContent('Mo: morado');
    expect(legend).toHaveTextContent('Bl: blanco');
    expect(legend).not.toHaveTextContent(/Wh|Ye|Pu/);
  });
});
