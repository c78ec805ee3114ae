import { makeStyles, Spinner, tokens } from '@fluentui/react-components';
import type { Group } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { groupsQueryOptions } from '../../../api/groups/groups.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { EmptyState, ErrorState } from '../../../components/states/index.js';
import { hgTokens } from '../../../theme/index.js';

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

  let body;
  if (groups.isPending) body = <Spinner size="small" label="Loading the groups" />;
  else if (groups.isError)
    body = <ErrorState title="The list of groups did not load." message={groups.error.message} onRetry={() => void groups.refetch()} />;
  else if (groups.data.length === 0)
    body = <EmptyState title="No growing groups have joined yet.">When a group starts its first season, it shows here.</EmptyState>;
  else
    body = (
      <ul className={styles.list}>
        {groups.data.map((g) => (
          <li key={g.id}>
            <div className={styles.name}>{g.name}</div>
            <div className={styles.meta}>{describeGroup(g)}</div>
          </li>
        ))}
      </ul>
    );

  return (
    <ContentCard aria-labelledby="growing-groups">
      <Heading level="section" id="growing-groups">
        Groups growing with Homeground
      </Heading>
      {body}
    </ContentCard>
  );
}
