import { Navigate } from 'react-router-dom';
import { paths } from '../config/paths.js';
import { ShareReportPage } from '../features/share-report/index.js';
import { useTranslation } from 'react-i18next';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { organisedGroup } from './plant-share-session.js';
import { SignedInGate } from './signed-in-gate.js';

/** The season report of the organiser's group's plant share. */
export function PlantShareReportRoute() {
  const { t } = useTranslation('report');
  useDocumentTitle(t('pageTitle'));
  return (
    <SignedInGate loading={t('loading')}>
      {(user) => {
        const group = organisedGroup(user);
        if (!group) return <Navigate to={paths.plantShare.build()} replace />;
        return <ShareReportPage key={group.slug} groupSlug={group.slug} />;
      }}
    </SignedInGate>
  );
}
