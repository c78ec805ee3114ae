import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function PlantSharePickupRoute() {
  useDocumentTitle('Plant share');
  return <SectionPlaceholder title="Plant share" willDo="Here organisers will follow the plant share." />;
}
