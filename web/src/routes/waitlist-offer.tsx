import { useParams } from 'react-router-dom';
import { WaitlistOffer } from '../features/plant-share-taker/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A waitlist offer by the link in its e-mail; no account needed. */
export function WaitlistOfferRoute() {
  const { token = '' } = useParams();
  const { t } = useTranslation('taker');
  useDocumentTitle(t('offerTitle'));
  return <WaitlistOffer key={token} token={token} />;
}
