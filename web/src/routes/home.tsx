import { makeStyles, tokens } from '@fluentui/react-components';
import type { QueryClient } from '@tanstack/react-query';
import { groupsQueryOptions } from '../api/groups/groups.queries.js';
import { healthQueryOptions, statsQueryOptions } from '../api/system/system.queries.js';
import { CatalogueFigures, GrowingGroups, HomeHero, HowItWorks } from '../features/home/index.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

/**
 * Starts the home page's requests while its code is still downloading. Not awaited: each
 * section shows its own loading and error state rather than holding up the whole page.
 */
export function homeLoader(queryClient: QueryClient) {
  return () => {
    void queryClient.prefetchQuery(statsQueryOptions());
    void queryClient.prefetchQuery(healthQueryOptions());
    void queryClient.prefetchQuery(groupsQueryOptions());
    return null;
  };
}

const useStyles = makeStyles({ figures: { marginBottom: tokens.spacingVerticalXXL } });

export function HomeRoute() {
  const styles = useStyles();
  useDocumentTitle(null);
  return (
    <>
      <HomeHero />
      <HowItWorks />
      <div className={styles.figures}>
        <CatalogueFigures />
      </div>
      <GrowingGroups />
    </>
  );
}
