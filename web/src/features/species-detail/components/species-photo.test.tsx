import { FluentProvider, webLightTheme } from '@fluentui/react-components';
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { butterflyMilkweedRecord } from '../testing/species-record.js';
import { SpeciesPhoto } from './species-photo.js';

const renderPhoto = (species: typeof butterflyMilkweedRecord) =>
  render(
    <FluentProvider theme={webLightTheme}>
      <SpeciesPhoto species={species} />
    </FluentProvider>,
  );

// Credit lines name the photographer and the licence, and link the source (Creative Commons'
// "TASL" attribution practice: title, author, source, licence).
describe('species photo credit', () => {
  it('names who took the photo, its licence, and links its source', () => {
    renderPhoto({
      ...butterflyMilkweedRecord,
      hasPhoto: true,
      photoCredit: { photographer: 'Ines Calder', licence: 'CC-BY-SA-4.0', sourceUrl: 'https://example.org/p/7' },
    });
    expect(screen.getByText(/Photo: Ines Calder, CC BY-SA 4\.0/)).toBeInTheDocument();
    expect(screen.getByRole('link', { name: /source of the photo/ })).toHaveAttribute(
      'href',
      'https://example.org/p/7',
    );
  });

  it('says there is no photo yet when there is none', () => {
    renderPhoto(butterflyMilkweedRecord);
    expect(screen.getByText(/No photo yet/)).toBeInTheDocument();
    expect(screen.queryByRole('link')).toBeNull();
  });
});
