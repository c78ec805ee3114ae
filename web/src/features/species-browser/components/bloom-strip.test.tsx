import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { BloomStrip } from './bloom-strip.js';

// Bloom months and colour of butterfly milkweed: species-data/species/asclepias-tuberosa.json.
describe('bloom strip', () => {
  it('says its months and colour to a screen reader and marks the bloom months', () => {
    const { container } = render(<BloomStrip bloomMonths={[6, 7, 8]} flowerColours={['orange']} />);
    expect(screen.getByRole('img', { name: 'Blooms Jun–Aug; orange flowers' })).toBeInTheDocument();
    const blooming = [...container.querySelectorAll('[data-blooming]')].map((c) => c.getAttribute('data-month'));
    expect(blooming).toEqual(['6', '7', '8']);
    expect(container.querySelectorAll('[data-month]')).toHaveLength(12);
  });

  it('says when no bloom months are recorded (e.g. a fern)', () => {
    render(<BloomStrip bloomMonths={[]} flowerColours={[]} />);
    expect(screen.getByRole('img', { name: 'No bloom months recorded' })).toBeInTheDocument();
  });
});
