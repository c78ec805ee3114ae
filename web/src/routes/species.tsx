import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function SpeciesRoute() {
  useDocumentTitle('Species');
  return (
    <SectionPlaceholder
      title="Species"
      willDo="Here you will browse every native species in the catalogue, with its bloom period, height in feet and metres, and how to grow it from seed."
    />
  );
}
