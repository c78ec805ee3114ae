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

function describeGroup(group: Group): string {
  const place = `${group.town}, ${group.state}`;
  const ecoregion = group.ecoregionCode ? ` · ecoregion ${group.ecoregionCode}` : '';
  const people = `${group.members} ${group.members === 1 ? 'member' : 'members'}`;
  return `${place}${ecoregion} · ${people}`;
}

/** The groups growing with Homeground (GET /api/groups, public). */
export function GrowingGroups() {
  const styles = useStyles();
  const groups = useQuery(groupsQueryOptions());

  return (
    <ContentCard aria-labelledby="growing-groups">
      <Heading level="section" id="growing-groups">
        Groups growing with Homeground
      </Heading>
      <QueryState
        query={groups}
        loading={<Spinner size="small" label="Loading the groups" />}
        error="The list of groups did not load."
        isEmpty={(data) => data.length === 0}
        empty={() => (
          <EmptyState title="No growing groups have joined yet.">
            When a group starts its first season, it shows here.
          </EmptyState>
        )}
      >
        {(data) => (
          <ul className={styles.list}>
            {data.map((g) => (
              <li key={g.id}>
                <div className={styles.name}>
                  <RouterLink to={paths.group.build(g.slug)}>{g.name}</RouterLink>
                </div>
                <div className={styles.meta}>{describeGroup(g)}</div>
              </li>
            ))}
          </ul>
        )}
      </QueryState>
    </ContentCard>
  );
}
