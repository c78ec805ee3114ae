import { useTranslation } from 'react-i18next';
import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function MyBatchesRoute() {
  const { t } = useTranslation();
  useDocumentTitle(t('nav.myBatches'));
  return <SectionPlaceholder title={t('nav.myBatches')} willDo={t('placeholder.myBatches')} />;
}
