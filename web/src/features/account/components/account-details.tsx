import { makeStyles, tokens } from '@fluentui/react-components';
import { GLOBAL_ROLE_WORDS, GROUP_ROLE_WORDS, type User } from '@homeground/shared';
import { RouterLink } from '../../../components/links/router-link.js';
import { paths } from '../../../config/paths.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { EmptyState } from '../../../components/states/index.js';
import { hgTokens } from '../../../theme/index.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gap: tokens.spacingVerticalXL, maxWidth: '720px' },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalXL,
    rowGap: tokens.spacingVerticalS,
    margin: 0,
    '@media (max-width: 480px)': { gridTemplateColumns: '1fr', rowGap: tokens.spacingVerticalXS },
  },
  term: { color: hgTokens.hgColorLoam },
  value: { margin: 0, overflowWrap: 'anywhere' },
  groups: { listStyleType: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalS },
  groupName: { fontWeight: tokens.fontWeightSemibold },
});

const joined = new Intl.DateTimeFormat('en-US', { dateStyle: 'long' });

/** The signed-in person as GET /api/me describes them. */
export function AccountDetails({ user }: { user: User }) {
  const styles = useStyles();
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="account-you">
        <Heading level="section" id="account-you">
          You
        </Heading>
        <dl className={styles.facts}>
          <dt className={styles.term}>Name</dt>
          <dd className={styles.value}>{user.displayName}</dd>
          <dt className={styles.term}>E-mail</dt>
          <dd className={styles.value}>{user.email}</dd>
          <dt className={styles.term}>Role</dt>
          <dd className={styles.value}>
            {GLOBAL_ROLE_WORDS[user.role].title}: {GLOBAL_ROLE_WORDS[user.role].does.toLowerCase()}
          </dd>
          <dt className={styles.term}>Joined</dt>
          <dd className={styles.value}>{joined.format(new Date(user.createdAt))}</dd>
        </dl>
      </ContentCard>
      <ContentCard aria-labelledby="account-groups">
        <Heading level="section" id="account-groups">
          Your groups
        </Heading>
        {user.groups.length === 0 ? (
          <EmptyState title="You are not in a growing group yet.">
            An organiser invites you to their group by e-mail; then the group shows up here.
          </EmptyState>
        ) : (
          <ul className={styles.groups}>
            {user.groups.map((g) => (
              <li key={g.groupId}>
                <RouterLink className={styles.groupName} to={paths.group.build(g.groupSlug)}>
                  {g.groupName}
                </RouterLink>{' '}
                · {GROUP_ROLE_WORDS[g.role].title}
              </li>
            ))}
          </ul>
        )}
      </ContentCard>
    </div>
  );
}
