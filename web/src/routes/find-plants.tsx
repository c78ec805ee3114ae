import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function FindPlantsRoute() {
  useDocumentTitle('Find plants');
  return (
    <SectionPlaceholder
      title="Find plants"
      willDo="Here you will tell Homeground where your ground is, by state, county or ecoregion, and get a yard mix of native plants that grow there, with why each one fits."
    />
  );
}
