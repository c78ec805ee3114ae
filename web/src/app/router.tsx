import type { QueryClient } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { createBrowserRouter, type RouteObject } from 'react-router-dom';
import { LoadingState } from '../components/states/index.js';
import { paths } from '../config/paths.js';
import { RootLayout } from '../routes/root-layout.js';
import { RouteErrorPage } from '../routes/route-error.js';

/**
 * Each page is its own chunk, fetched on first visit, so the first load carries only the shell.
 * A lazy route needs its own fallback: without one the router blanks the whole shell while the
 * first page's code arrives (react-router renders from the nearest route that has a fallback).
 */
function PageFallback() {
  const { t } = useTranslation();
  return <LoadingState label={t('shell.loadingPage')} />;
}
const pageFallback = <PageFallback />;

type LazyRoute = NonNullable<RouteObject['lazy']>;

function page(path: string | undefined, lazy: LazyRoute): RouteObject {
  return path === undefined
    ? { index: true, lazy, hydrateFallbackElement: pageFallback }
    : { path, lazy, hydrateFallbackElement: pageFallback };
}

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      element: <RootLayout />,
      errorElement: <RouteErrorPage />,
      children: [
        {
          // Errors inside a page render within the shell, so the navigation stays usable.
          errorElement: <RouteErrorPage />,
          children: [
            page(undefined, async () => {
              const m = await import('../routes/home.js');
              return { Component: m.HomeRoute, loader: m.homeLoader(queryClient) };
            }),
            page(paths.signIn.path, async () => ({ Component: (await import('../routes/sign-in.js')).SignInRoute })),
            page(paths.register.path, async () => ({
              Component: (await import('../routes/register.js')).RegisterRoute,
            })),
            page(paths.confirmRegistration.path, async () => ({
              Component: (await import('../routes/confirm-registration.js')).ConfirmRegistrationRoute,
            })),
            page(paths.account.path, async () => ({ Component: (await import('../routes/account.js')).AccountRoute })),
            page(paths.findPlants.path, async () => ({
              Component: (await import('../routes/find-plants.js')).FindPlantsRoute,
            })),
            page(paths.savedMix.path, async () => ({
              Component: (await import('../routes/mix-saved.js')).SavedMixRoute,
            })),
            page(paths.species.path, async () => {
              const m = await import('../routes/species.js');
              return { Component: m.SpeciesRoute, loader: m.speciesLoader(queryClient) };
            }),
            page(paths.speciesDetail.path, async () => {
              const m = await import('../routes/species-detail.js');
              return { Component: m.SpeciesDetailRoute, loader: m.speciesDetailLoader(queryClient) };
            }),
            page(paths.speciesImport.path, async () => ({
              Component: (await import('../routes/species-import.js')).SpeciesImportRoute,
            })),
            page(paths.speciesNew.path, async () => ({
              Component: (await import('../routes/species-editor.js')).SpeciesNewRoute,
            })),
            page(paths.speciesEdit.path, async () => ({
              Component: (await import('../routes/species-editor.js')).SpeciesEditRoute,
            })),
            page(paths.cardsLabels.path, async () => ({
              Component: (await import('../routes/cards-and-labels.js')).CardsLabelsRoute,
            })),
            page(paths.group.path, async () => ({ Component: (await import('../routes/group.js')).GroupRoute })),
            page(paths.invitation.path, async () => ({
              Component: (await import('../routes/invitation.js')).InvitationRoute,
            })),
            page(paths.referenceChecks.path, async () => ({
              Component: (await import('../routes/reference-checks.js')).ReferenceChecksRoute,
            })),
            page(paths.people.path, async () => ({ Component: (await import('../routes/people.js')).PeopleRoute })),
            page(paths.season.path, async () => ({ Component: (await import('../routes/season.js')).SeasonRoute })),
            page(paths.myBatches.path, async () => ({
              Component: (await import('../routes/my-batches.js')).MyBatchesRoute,
            })),
            page(paths.plantShare.path, async () => ({
              Component: (await import('../routes/plant-share.js')).PlantShareRoute,
            })),
            page(paths.plantSharePickup.path, async () => ({
              Component: (await import('../routes/plant-share-pickup.js')).PlantSharePickupRoute,
            })),
            page(paths.plantShareReport.path, async () => ({
              Component: (await import('../routes/plant-share-report.js')).PlantShareReportRoute,
            })),
            page(paths.shareAvailable.path, async () => ({
              Component: (await import('../routes/share-available.js')).ShareAvailableRoute,
            })),
            page(paths.reservation.path, async () => ({
              Component: (await import('../routes/reservation.js')).ReservationRoute,
            })),
            page(paths.waitlistOffer.path, async () => ({
              Component: (await import('../routes/waitlist-offer.js')).WaitlistOfferRoute,
            })),
            page('*', async () => ({ Component: (await import('../routes/not-found.js')).NotFoundRoute })),
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}
