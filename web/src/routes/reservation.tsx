import { useParams } from 'react-router-dom';
import { MyReservation } from '../features/plant-share-taker/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A reservation by its private link; no account needed. */
export function ReservationRoute() {
  const { token = '' } = useParams();
  const { t } = useTranslation('taker');
  useDocumentTitle(t('myReservationTitle'));
  return <MyReservation key={token} token={token} />;
}
