import { useTranslation } from 'react-i18next';
import { SectionPlaceholder } from '../components/page/section-placeholder.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function PlantShareRoute() {
  const { t } = useTranslation();
  useDocumentTitle(t('nav.plantShare'));
  return <SectionPlaceholder title={t('nav.plantShare')} willDo={t('placeholder.plantShare')} />;
}
