import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function PlantShareRoute() {
  useDocumentTitle('Plant share');
  return (
    <SectionPlaceholder
      title="Plant share"
      willDo="Here your group will run its plant share: neighbours reserve plants and choose a pickup slot, and organisers see who takes what home."
    />
  );
}
