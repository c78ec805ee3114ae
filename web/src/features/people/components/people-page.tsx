import {
  Button,
  Dropdown,
  makeStyles,
  Option,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import { GLOBAL_ROLES, type GlobalRole, type PersonAccount } from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { useSetAccessMutation, useSetRoleMutation } from '../../../api/people/people.mutations.js';
import { peopleQueryOptions } from '../../../api/people/people.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';
import { useFormatters, useWords } from '../../../lib/i18n/index.js';

const useStyles = makeStyles({
  scroll: { overflowX: 'auto' },
  hint: { margin: 0, color: tokens.colorNeutralForeground3 },
  email: { overflowWrap: 'anywhere' },
  off: { color: tokens.colorPaletteRedForeground1, fontWeight: tokens.fontWeightSemibold },
  failure: { color: tokens.colorPaletteRedForeground1 },
  roleCell: { width: '10rem' },
  // Fluent's dropdown asks for 250 px by default; the role words are short.
  role: { minWidth: 'unset', width: '100%' },
});

/**
 * "Last signed in" in the page's language: a date and time, or "never" for accounts that have only
 * used an invitation link, and whether sign-in is held back after wrong passwords.
 */
export function useSignInWords(): (p: Pick<PersonAccount, 'lastSignInAt' | 'signInHeld'>) => string {
  const { t } = useTranslation('people');
  const format = useFormatters();
  return (p) => {
    const last = p.lastSignInAt ? format.moment(p.lastSignInAt) : t('row.never');
    return p.signInHeld ? t('row.held', { last }) : last;
  };
}

/**
 * The admin's people page: every account with its role across Homeground, its groups and how it signs
 * in; change a role, switch an account off or on. The signed-in admin's own row cannot be changed, so
 * an admin always remains to undo a mistake.
 */
export function PeoplePage({ myId }: { myId: string }) {
  const styles = useStyles();
  const people = useQuery(peopleQueryOptions());
  const setRole = useSetRoleMutation();
  const setAccess = useSetAccessMutation();
  const failure = setRole.error ?? setAccess.error;
  const { t } = useTranslation('people');
  const words = useWords();
  const signInWords = useSignInWords();

  return (
    <ContentCard aria-labelledby="people-heading">
      <Heading level="section" id="people-heading">
        {t('list.heading')}
      </Heading>
      <p className={styles.hint}>
        {GLOBAL_ROLES.map((r) =>
          t('list.roleLine', { title: words.globalRole[r].title, does: words.globalRole[r].does }),
        ).join(' ')}{' '}
        {t('list.switchHint')}
      </p>
      <QueryState query={people} loading={t('list.loading')} error={t('list.error')}>
        {(list: PersonAccount[]) => (
          <div className={styles.scroll} role="region" aria-label={t('list.scrollRegion')} tabIndex={0}>
            <Table aria-label={t('list.heading')} size="small">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>{t('columns.name')}</TableHeaderCell>
                  <TableHeaderCell>{t('columns.email')}</TableHeaderCell>
                  <TableHeaderCell>{t('columns.role')}</TableHeaderCell>
                  <TableHeaderCell>{t('columns.groups')}</TableHeaderCell>
                  <TableHeaderCell>{t('columns.lastSignIn')}</TableHeaderCell>
                  <TableHeaderCell>{t('columns.account')}</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {list.map((p) => {
                  const isMe = p.id === myId;
                  const off = p.disabledAt !== null;
                  return (
                    <TableRow key={p.id}>
                      <TableCell>{isMe ? t('row.you', { name: p.displayName }) : p.displayName}</TableCell>
                      <TableCell className={styles.email}>{p.email}</TableCell>
                      <TableCell className={styles.roleCell}>
                        <Dropdown
                          className={styles.role}
                          size="small"
                          aria-label={t('row.roleOf', { name: p.displayName })}
                          value={words.globalRole[p.role].title}
                          selectedOptions={[p.role]}
                          disabled={isMe || setRole.isPending}
                          onOptionSelect={(_, d) => {
                            const role = d.optionValue as GlobalRole | undefined;
                            if (role && role !== p.role) setRole.mutate({ id: p.id, role });
                          }}
                        >
                          {GLOBAL_ROLES.map((r) => (
                            <Option key={r} value={r}>
                              {words.globalRole[r].title}
                            </Option>
                          ))}
                        </Dropdown>
                      </TableCell>
                      <TableCell>
                        {p.groups.length
                          ? p.groups
                              .map((g) =>
                                t('row.groupRole', { group: g.groupName, role: words.groupRole[g.role].title }),
                              )
                              .join(', ')
                          : t('row.noGroups')}
                      </TableCell>
                      <TableCell>{signInWords(p)}</TableCell>
                      <TableCell>
                        {off ? <span className={styles.off}>{t('row.off')} </span> : null}
                        {isMe ? null : (
                          <Button
                            size="small"
                            disabled={setAccess.isPending}
                            onClick={() => setAccess.mutate({ id: p.id, disabled: !off })}
                            aria-label={t(off ? 'row.switchOnLabel' : 'row.switchOffLabel', { name: p.displayName })}
                          >
                            {off ? t('row.switchOn') : t('row.switchOff')}
                          </Button>
                        )}
                      </TableCell>
                    </TableRow>
                  );
                })}
              </TableBody>
            </Table>
          </div>
        )}
      </QueryState>
      {failure ? (
        <p className={styles.failure} role="alert">
          {failure.message}
        </p>
      ) : null}
    </ContentCard>
  );
}
