import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function MyBatchesRoute() {
  useDocumentTitle('My batches');
  return (
    <SectionPlaceholder
      title="My batches"
      willDo="Here growers will see the batches they have been given and keep a batch log of what they sowed, what came up and what is ready."
    />
  );
}
