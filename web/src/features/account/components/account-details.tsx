import { LOCALE_TAGS, useLocale, useWords } from '../../../lib/i18n/index.js';
import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import type { User } from '@homeground/shared';
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

/** The signed-in person as GET /api/me describes them. */
export function AccountDetails({ user }: { user: User }) {
  const styles = useStyles();
  const { t } = useTranslation('forms');
  const words = useWords();
  const { locale } = useLocale();
  const joined = new Intl.DateTimeFormat(LOCALE_TAGS[locale], { dateStyle: 'long' });
  return (
    <div className={styles.stack}>
      <ContentCard aria-labelledby="account-you">
        <Heading level="section" id="account-you">
          {t('account.you')}
        </Heading>
        <dl className={styles.facts}>
          <dt className={styles.term}>{t('account.name')}</dt>
          <dd className={styles.value}>{user.displayName}</dd>
          <dt className={styles.term}>{t('account.email')}</dt>
          <dd className={styles.value}>{user.email}</dd>
          <dt className={styles.term}>{t('account.role')}</dt>
          <dd className={styles.value}>
            {t('account.roleLine', {
              title: words.globalRole[user.role].title,
              does: words.globalRole[user.role].does.toLowerCase(),
            })}
          </dd>
          <dt className={styles.term}>{t('account.joined')}</dt>
          <dd className={styles.value}>{joined.format(new Date(user.createdAt))}</dd>
        </dl>
      </ContentCard>
      <ContentCard aria-labelledby="account-groups">
        <Heading level="section" id="account-groups">
          {t('account.groups')}
        </Heading>
        {user.groups.length === 0 ? (
          <EmptyState title={t('account.noGroupTitle')}>{t('account.noGroupText')}</EmptyState>
        ) : (
          <ul className={styles.groups}>
            {user.groups.map((g) => (
              <li key={g.groupId}>
                <RouterLink className={styles.groupName} to={paths.group.build(g.groupSlug)}>
                  {g.groupName}
                </RouterLink>{' '}
                · {words.groupRole[g.role].title}
              </li>
            ))}
          </ul>
        )}
      </ContentCard>
    </div>
  );
}
