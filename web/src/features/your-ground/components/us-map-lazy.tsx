import { useTranslation } from 'react-i18next';
import { makeStyles, Skeleton, SkeletonItem } from '@fluentui/react-components';
import { lazy, Suspense } from 'react';
import type { UsMapProps } from './us-map.js';

// The map's boundaries (us-atlas) and d3-geo are about 150 kB; they load only when this step shows.
const UsMap = lazy(() => import('./us-map.js').then((m) => ({ default: m.UsMap })));

const useStyles = makeStyles({ placeholder: { width: '100%', aspectRatio: '975 / 610', height: 'auto' } });

export function LazyUsMap(props: UsMapProps) {
  const styles = useStyles();
  const { t } = useTranslation('ground');
  return (
    <Suspense
      fallback={
        <Skeleton aria-label={t('step.mapLoading')}>
          <SkeletonItem className={styles.placeholder} />
        </Skeleton>
      }
    >
      <UsMap {...props} />
    </Suspense>
  );
}
