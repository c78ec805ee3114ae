import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function CardsLabelsRoute() {
  useDocumentTitle('Cards & labels');
  return (
    <SectionPlaceholder
      title="Cards & labels"
      willDo="Here you will print fact cards and pot labels for the plants you grow, black on white so they stay readable when photocopied."
    />
  );
}
