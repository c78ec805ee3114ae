import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function SeasonRoute() {
  useDocumentTitle('Season');
  return (
    <SectionPlaceholder
      title="Season"
      willDo="Here organisers will build the season plan: which species the group grows, targets for each, and the seed list to buy or collect."
    />
  );
}
