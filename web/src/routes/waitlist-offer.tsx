import { useParams } from 'react-router-dom';
import { WaitlistOffer } from '../features/plant-share-taker/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A waitlist offer by the link in its e-mail; no account needed. */
export function WaitlistOfferRoute() {
  const { token = '' } = useParams();
  useDocumentTitle('Plants held for you');
  return <WaitlistOffer key={token} token={token} />;
}
