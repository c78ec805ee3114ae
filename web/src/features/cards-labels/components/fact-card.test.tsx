import { FluentProvider } from '@fluentui/react-components';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { homegroundTheme } from '../../../theme/index.js';
import { useQrEncoder } from '../hooks/use-qr-encoder.js';
import { butterflyMilkweed, wildBergamot } from '../testing/card-fixtures.js';
import { decodeQrSvg } from '../testing/decode-qr.js';
import { FactCard } from './fact-card.js';

/** Renders and waits for the QR encoder, so every later state update has happened. */
async function renderCard(species: typeof butterflyMilkweed) {
  render(<Card species={species} />);
  await screen.findByRole('img', { name: /^QR code linking to/ });
}

// The invented scenario's public address, as PUBLIC_URL would set it.
const PUBLIC_ORIGIN = 'https://plants.larkfield.example';

function Card({ species }: { species: typeof butterflyMilkweed }) {
  const qr = useQrEncoder();
  return (
    <FluentProvider theme={homegroundTheme}>
      <FactCard species={species} qr={qr} layoutKey="letter" origin={PUBLIC_ORIGIN} />
    </FluentProvider>
  );
}

// Expected words come from the record (species-data/species/asclepias-tuberosa.json: cold-moist
// 30 days, 6 mm deep, genus count 12 from tallamy-shropshire-2009, monarch host) and the
// brief's card wording; 30–75 cm is 12–30 in at 2.54 cm to the inch.
describe('fact card', () => {
  it('shows names, bloom, growing needs, wildlife value with its source, and seed treatment in plain words', async () => {
    await renderCard(butterflyMilkweed);
    const card = screen.getByRole('article', { name: 'Butterfly milkweed' });
    const c = within(card);
    expect(c.getByText('Asclepias tuberosa')).toBeInTheDocument();
    expect(c.getByText('Flowers orange')).toBeInTheDocument();
    expect(c.getByText('Blooms Jun–Aug')).toBeInTheDocument();
    expect(c.getByText('Full sun or part shade')).toBeInTheDocument();
    expect(c.getByText('Dry or medium-moist soil')).toBeInTheDocument();
    expect(c.getByText('12–30 in (30–75 cm)')).toBeInTheDocument();
    expect(
      c.getByText(/Asclepias hosts the caterpillars of 12 moth and butterfly species \(Tallamy & Shropshire 2009\)/),
    ).toBeInTheDocument();
    expect(c.getByText(/Monarch host plant/)).toBeInTheDocument();
    expect(
      c.getByText(
        /^Cold-moist stratification, 30 days: mix the seed with damp sand in a sealed bag in the refrigerator\./,
      ),
    ).toBeInTheDocument();
    expect(c.getByText('Sow 6 mm (¼ in) deep.')).toBeInTheDocument();
    expect(c.getByText(/Works with winter sowing in covered containers/)).toBeInTheDocument();
  });

  it('shows each caution with its heading and the record’s own words', async () => {
    await renderCard(butterflyMilkweed);
    const card = within(screen.getByRole('article', { name: 'Butterfly milkweed' }));
    expect(card.getByRole('heading', { name: 'Cautions' })).toBeInTheDocument();
    expect(card.getByText('Irritating sap:')).toBeInTheDocument();
    expect(card.getByText(/Milky sap can injure the eye hours after contact/)).toBeInTheDocument();
    expect(card.getByText('Toxic if eaten:')).toBeInTheDocument();
    expect(card.getByText(/noxious-weed list and local rules/)).toBeInTheDocument();
  });

  it('draws a QR code that decodes to the species page at the public address, not the serving origin', async () => {
    render(<Card species={butterflyMilkweed} />);
    const url = `${PUBLIC_ORIGIN}/species/asclepias-tuberosa`;
    const qr = await screen.findByRole('img', { name: `QR code linking to ${url}` });
    expect(qr.tagName.toLowerCase()).toBe('svg');
    expect(qr.getAttribute('data-url')).toBe(url);
    expect(qr.querySelector('path')?.getAttribute('d')).toMatch(/^M\d+ \d+h1v1h-1z/);
    expect(decodeQrSvg(qr)).toBe(url);
    expect(window.location.origin).not.toBe(PUBLIC_ORIGIN);
  });

  it('says when light is needed, has no caution section without cautions, and names both flower colours', async () => {
    await renderCard(wildBergamot);
    const card = within(screen.getByRole('article', { name: 'Wild bergamot' }));
    expect(card.getByText('Flowers lavender and pink')).toBeInTheDocument();
    expect(card.getByText(/^Needs light to germinate/)).toBeInTheDocument();
    expect(card.getByText(/No pretreatment needed/)).toBeInTheDocument();
    expect(card.queryByRole('heading', { name: 'Cautions' })).toBeNull();
    expect(card.queryByText(/Monarch host plant/)).toBeNull();
  });

  it('prints the photo at its print size with the photographer and licence as a credit line', async () => {
    // The photographer is from the invented demo scenario; CC BY 4.0 is a published licence.
    await renderCard({
      ...butterflyMilkweed,
      hasPhoto: true,
      photoCredit: { photographer: 'Ines Calder', licence: 'CC-BY-4.0', sourceUrl: 'https://example.org/photos/1' },
    });
    const card = screen.getByRole('article', { name: 'Butterfly milkweed' });
    expect(card.querySelector('img[src="/api/species/asclepias-tuberosa/photo?w=400"]')).not.toBeNull();
    expect(within(card).getByText(/^Photo: Ines Calder, CC BY 4\.0/)).toBeInTheDocument();
  });

  it('prints no photo and no credit line for a species without a photo', async () => {
    await renderCard(butterflyMilkweed);
    const card = screen.getByRole('article', { name: 'Butterfly milkweed' });
    expect(card.querySelector('img[src*="/photo"]')).toBeNull();
    expect(within(card).queryByText(/^Photo:/)).toBeNull();
  });
});
