import { useParams } from 'react-router-dom';
import { AvailablePage } from '../features/plant-share-taker/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';

/** A group's plant share for anyone with the link: what is available, fits my yard, reserve. */
export function ShareAvailableRoute() {
  const { groupSlug = '' } = useParams();
  const { t } = useTranslation('taker');
  useDocumentTitle(t('directoryTitle'));
  return <AvailablePage key={groupSlug} groupSlug={groupSlug} />;
}
