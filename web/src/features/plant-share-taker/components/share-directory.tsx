import { makeStyles, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { groupsQueryOptions } from '../../../api/groups/groups.queries.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { QueryState } from '../../../components/states/index.js';
import { paths } from '../../../config/paths.js';
import { useTranslation } from 'react-i18next';

const useStyles = makeStyles({
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalXL, display: 'grid', gap: tokens.spacingVerticalS },
});

/** For someone who is not an organiser: each growing group's plant share page, to reserve from. */
export function ShareDirectory() {
  const { t } = useTranslation('taker');
  const styles = useStyles();
  const groups = useQuery(groupsQueryOptions());
  return (
    <>
      <PageIntro title={t('directoryTitle')}>{t('directoryLead')}</PageIntro>
      <QueryState
        query={groups}
        loading={t('loading')}
        error={t('loadFailed')}
        isEmpty={(g) => g.length === 0}
        empty={t('directoryEmpty')}
      >
        {(list) => (
          <ContentCard aria-label={t('directoryLabel')}>
            <ul className={styles.list}>
              {list.map((g) => (
                <li key={g.slug}>
                  <RouterLink to={paths.shareAvailable.build(g.slug)}>{g.name}</RouterLink>, {g.town}, {g.state}
                </li>
              ))}
            </ul>
          </ContentCard>
        )}
      </QueryState>
    </>
  );
}
