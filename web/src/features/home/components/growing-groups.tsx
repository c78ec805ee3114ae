import type { TFunction } from 'i18next';
import { useTranslation } from 'react-i18next';
import { makeStyles, Spinner, tokens } from '@fluentui/react-components';
import type { Group } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { groupsQueryOptions } from '../../../api/groups/groups.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { EmptyState, QueryState } from '../../../components/states/index.js';
import { hgTokens } from '../../../theme/index.js';
import { RouterLink } from '../../../components/links/router-link.js';
import { paths } from '../../../config/paths.js';

const useStyles = makeStyles({
  list: { listStyleType: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalM },
  name: { fontWeight: tokens.fontWeightSemibold },
  meta: { color: hgTokens.hgColorLoam, fontVariantNumeric: 'tabular-nums' },
});

/** Town, ecoregion and size as separate phrases joined by a middle dot (a list, not a sentence). */
function describeGroup(group: Group, t: TFunction<'home'>): string {
  return [
    t('groups.place', { town: group.town, state: group.state }),
    group.ecoregionCode ? t('groups.ecoregion', { code: group.ecoregionCode }) : null,
    t('groups.members', { count: group.members }),
  ]
    .filter(Boolean)
    .join(' · ');
}

/** The groups growing with Homeground (GET /api/groups, public). */
export function GrowingGroups() {
  const styles = useStyles();
  const { t } = useTranslation('home');
  const groups = useQuery(groupsQueryOptions());

  return (
    <ContentCard aria-labelledby="growing-groups">
      <Heading level="section" id="growing-groups">
        {t('groups.title')}
      </Heading>
      <QueryState
        query={groups}
        loading={<Spinner size="small" label={t('groups.loading')} />}
        error={t('groups.error')}
        isEmpty={(data) => data.length === 0}
        empty={() => <EmptyState title={t('groups.emptyTitle')}>{t('groups.emptyText')}</EmptyState>}
      >
        {(data) => (
          <ul className={styles.list}>
            {data.map((g) => (
              <li key={g.id}>
                <div className={styles.name}>
                  <RouterLink to={paths.group.build(g.slug)}>{g.name}</RouterLink>
                </div>
                <div className={styles.meta}>{describeGroup(g, t)}</div>
              </li>
            ))}
          </ul>
        )}
      </QueryState>
    </ContentCard>
  );
}
