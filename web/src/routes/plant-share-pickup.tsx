import { Navigate } from 'react-router-dom';
import { paths } from '../config/paths.js';
import { PickupPage } from '../features/plant-share-organiser/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';
import { organisedGroup } from './plant-share-session.js';
import { useTranslation } from 'react-i18next';
import { SignedInGate } from './signed-in-gate.js';

/** Pickup day (lists, check-in, walk-up) for the organiser's group; names are for organisers only. */
export function PlantSharePickupRoute() {
  const { t } = useTranslation('organiser');
  useDocumentTitle(t('pickupDay'));
  return (
    <SignedInGate loading={t('loading')}>
      {(user) => {
        const group = organisedGroup(user);
        if (!group) return <Navigate to={paths.plantShare.build()} replace />;
        return <PickupPage key={group.slug} groupSlug={group.slug} />;
      }}
    </SignedInGate>
  );
}
