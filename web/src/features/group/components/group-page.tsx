import { makeStyles, tokens } from '@fluentui/react-components';
import { type Group, type GroupRole, type StateCode, stateName } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useQuery } from '@tanstack/react-query';
import { groupQueryOptions, membersQueryOptions } from '../../../api/groups/groups.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { QueryState } from '../../../components/states/index.js';
import { InviteForm } from './invite-form.js';
import { MemberList } from './member-list.js';

const useStyles = makeStyles({
  stack: { display: 'grid', gap: tokens.spacingVerticalXL, maxWidth: '880px' },
  facts: {
    display: 'grid',
    gridTemplateColumns: 'max-content 1fr',
    columnGap: tokens.spacingHorizontalXL,
    rowGap: tokens.spacingVerticalS,
    margin: 0,
  },
  value: { margin: 0 },
});

/**
 * A growing group: where it grows and who is in it. `myRole` is the viewer's role in this group
 * (null for someone outside it); organisers see addresses, invite and remove people.
 */
export function GroupPage({ slug, myRole }: { slug: string; myRole: GroupRole | null }) {
  const styles = useStyles();
  const group = useQuery(groupQueryOptions(slug));
  const { t } = useTranslation('groups');
  return (
    <QueryState query={group} loading={t('page.loading')} error={t('page.error')}>
      {(g: Group) => (
        <>
          <PageIntro title={g.name}>
            {t('page.intro', {
              town: g.town,
              state: stateName(g.state as StateCode),
              ecoregion: g.ecoregionCode ? t('page.ecoregion', { code: g.ecoregionCode }) : '',
              count: g.members,
            })}
          </PageIntro>
          <div className={styles.stack}>
            {myRole ? <Members slug={slug} canManage={myRole === 'organiser'} /> : null}
            {myRole === 'organiser' ? (
              <ContentCard aria-labelledby="group-invite">
                <Heading level="section" id="group-invite">
                  {t('page.invite')}
                </Heading>
                <InviteForm slug={slug} groupName={g.name} />
              </ContentCard>
            ) : null}
          </div>
        </>
      )}
    </QueryState>
  );
}

function Members({ slug, canManage }: { slug: string; canManage: boolean }) {
  const members = useQuery(membersQueryOptions(slug));
  const { t } = useTranslation('groups');
  return (
    <ContentCard aria-labelledby="group-people">
      <Heading level="section" id="group-people">
        {t('page.people')}
      </Heading>
      <QueryState query={members} loading={t('page.peopleLoading')} error={t('page.peopleError')}>
        {(list) => <MemberList slug={slug} members={list} canManage={canManage} />}
      </QueryState>
    </ContentCard>
  );
}
