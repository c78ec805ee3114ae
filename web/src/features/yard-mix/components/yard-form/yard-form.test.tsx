import { FluentProvider } from '@fluentui/react-components';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { homegroundTheme } from '../../../../theme/index.js';
import { YardForm } from './yard-form.js';
import { checkYard, EMPTY_YARD } from '../../utils/yard-form-values.js';
import { createI18n, formattersFor } from '../../../../lib/i18n/index.js';

function renderForm() {
  const onSubmit = vi.fn();
  const user = userEvent.setup();
  render(
    <FluentProvider theme={homegroundTheme}>
      <YardForm initial={EMPTY_YARD} onSubmit={onSubmit} />
    </FluentProvider>,
  );
  return { onSubmit, user };
}

describe('YardForm', { timeout: 20_000 }, () => {
  it('keeps the form when sun is missing and the area is 0, with a message beside each field', async () => {
    const { onSubmit, user } = renderForm();
    await user.click(screen.getByRole('radio', { name: /^Medium/ }));
    await user.click(screen.getByRole('radio', { name: /^Sometimes/ }));
    await user.type(screen.getByRole('textbox', { name: /Area to plant/ }), '0');
    await user.click(screen.getByRole('button', { name: 'Show my yard mix' }));

    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByText('Choose how much sun the spot gets.')).toBeInTheDocument();
    expect(screen.getByText('The area must be more than 0.')).toBeInTheDocument();
    // Focus goes to the first question with a problem: the sun choices.
    expect(screen.getByRole('radio', { name: /^Full sun/ })).toHaveFocus();
  });

  it('refuses an area over 10 acres (the site schema limit, 435,600 ft²)', async () => {
    const { onSubmit, user } = renderForm();
    await user.click(screen.getByRole('radio', { name: /^Shade/ }));
    await user.click(screen.getByRole('radio', { name: /^Wet/ }));
    await user.click(screen.getByRole('radio', { name: /^Rarely/ }));
    await user.type(screen.getByRole('textbox', { name: /Area to plant/ }), '500000');
    await user.click(screen.getByRole('button', { name: 'Show my yard mix' }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(screen.getByText(/Homeground plans up to 10 acres \(435,600 ft²\)/)).toBeInTheDocument();
  });

  it('sends a valid shady, wet yard in m², showing ft² beside it as it is typed', async () => {
    const { onSubmit, user } = renderForm();
    await user.click(screen.getByRole('radio', { name: /^Shade/ }));
    await user.click(screen.getByRole('radio', { name: /^Wet/ }));
    await user.click(screen.getByRole('radio', { name: /^Often/ }));
    await user.click(screen.getByRole('radio', { name: 'square metres' }));
    await user.type(screen.getByRole('textbox', { name: /Area to plant/ }), '20');
    // 20 m² ÷ 0.09290304 m²/ft² (exact factor, shared units) = 215.3 ft².
    expect(screen.getByText('That is 215 ft².')).toBeInTheDocument();
    await user.click(screen.getByRole('checkbox', { name: /Rain garden/ }));
    await user.click(screen.getByRole('button', { name: 'Show my yard mix' }));
    expect(onSubmit).toHaveBeenCalledWith(
      { sun: 'shade', moisture: 'wet', areaSqM: 20, deerPressure: 'high', goals: ['rain-garden'] },
      'm2',
    );
  });
});

describe('checkYard', () => {
  const say = { t: createI18n('en').getFixedT('en', 'yard'), f: formattersFor('en') };
  it('turns a height in feet into centimetres and rejects one under 4 in', () => {
    const base = { ...EMPTY_YARD, sun: 'full', moisture: 'dry', deerPressure: 'low', area: '200' } as const;
    // 3 ft = 36 in × 2.54 cm/in (exact) = 91.44 cm, rounded to 91.
    expect(checkYard({ ...base, maxHeight: '3' }, say)).toMatchObject({ ok: true, site: { maxHeightCm: 91 } });
    expect(checkYard({ ...base, maxHeight: '2', heightUnit: 'cm' }, say)).toMatchObject({
      ok: false,
      errors: { maxHeight: 'The tallest plant must be at least 4 in (10 cm).' },
    });
  });
});
