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
import {
  GLOBAL_ROLE_WORDS,
  GLOBAL_ROLES,
  GROUP_ROLE_WORDS,
  type GlobalRole,
  type PersonAccount,
} from '@homeground/shared';
import { useQuery } from '@tanstack/react-query';
import { useSetAccessMutation, useSetRoleMutation } from '../../../api/people/people.mutations.js';
import { peopleQueryOptions } from '../../../api/people/people.queries.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';
import { QueryState } from '../../../components/states/index.js';

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

const dateTime = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium', timeStyle: 'short' });

/** "Last signed in" in words: a date, or "never" for accounts that have only used an invitation link. */
export function signInWords(p: Pick<PersonAccount, 'lastSignInAt' | 'signInHeld'>): string {
  const last = p.lastSignInAt ? dateTime.format(new Date(p.lastSignInAt)) : 'Never';
  return p.signInHeld ? `${last} · held back after too many wrong passwords` : last;
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

  return (
    <ContentCard aria-labelledby="people-heading">
      <Heading level="section" id="people-heading">
        Everyone with an account
      </Heading>
      <p className={styles.hint}>
        {GLOBAL_ROLES.map((r) => `${GLOBAL_ROLE_WORDS[r].title}: ${GLOBAL_ROLE_WORDS[r].does}`).join(' ')} Switching an
        account off signs the person out at once; their groups and history stay.
      </p>
      <QueryState query={people} loading="Loading people" error="The list of people did not load.">
        {(list: PersonAccount[]) => (
          <div className={styles.scroll} role="region" aria-label="People, scrolls sideways on a phone" tabIndex={0}>
            <Table aria-label="Everyone with an account" size="small">
              <TableHeader>
                <TableRow>
                  <TableHeaderCell>Name</TableHeaderCell>
                  <TableHeaderCell>E-mail</TableHeaderCell>
                  <TableHeaderCell>Role</TableHeaderCell>
                  <TableHeaderCell>Groups</TableHeaderCell>
                  <TableHeaderCell>Last signed in</TableHeaderCell>
                  <TableHeaderCell>Account</TableHeaderCell>
                </TableRow>
              </TableHeader>
              <TableBody>
                {list.map((p) => {
                  const isMe = p.id === myId;
                  const off = p.disabledAt !== null;
                  return (
                    <TableRow key={p.id}>
                      <TableCell>
                        {p.displayName}
                        {isMe ? ' (you)' : ''}
                      </TableCell>
                      <TableCell className={styles.email}>{p.email}</TableCell>
                      <TableCell className={styles.roleCell}>
                        <Dropdown
                          className={styles.role}
                          size="small"
                          aria-label={`Role of ${p.displayName}`}
                          value={GLOBAL_ROLE_WORDS[p.role].title}
                          selectedOptions={[p.role]}
                          disabled={isMe || setRole.isPending}
                          onOptionSelect={(_, d) => {
                            const role = d.optionValue as GlobalRole | undefined;
                            if (role && role !== p.role) setRole.mutate({ id: p.id, role });
                          }}
                        >
                          {GLOBAL_ROLES.map((r) => (
                            <Option key={r} value={r}>
                              {GLOBAL_ROLE_WORDS[r].title}
                            </Option>
                          ))}
                        </Dropdown>
                      </TableCell>
                      <TableCell>
                        {p.groups.length
                          ? p.groups.map((g) => `${g.groupName} (${GROUP_ROLE_WORDS[g.role].title})`).join(', ')
                          : 'None'}
                      </TableCell>
                      <TableCell>{signInWords(p)}</TableCell>
                      <TableCell>
                        {off ? <span className={styles.off}>Switched off </span> : null}
                        {isMe ? null : (
                          <Button
                            size="small"
                            disabled={setAccess.isPending}
                            onClick={() => setAccess.mutate({ id: p.id, disabled: !off })}
                            aria-label={`${off ? 'Switch on' : 'Switch off'} the account of ${p.displayName}`}
                          >
                            {off ? 'Switch on' : 'Switch off'}
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
