import {
  Button,
  Dialog,
  useRestoreFocusTarget,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  makeStyles,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  tokens,
} from '@fluentui/react-components';
import type { GroupMember } from '@homeground/shared';
import { useTranslation } from 'react-i18next';
import { useWords } from '../../../lib/i18n/index.js';
import { useState } from 'react';
import { useRemoveMemberMutation } from '../../../api/groups/groups.mutations.js';

const useStyles = makeStyles({
  scroll: { overflowX: 'auto' },
  email: { overflowWrap: 'anywhere' },
  failure: { color: tokens.colorPaletteRedForeground1 },
});

/** The group's people. Organisers see addresses and can take someone out of the group. */
export function MemberList({ slug, members, canManage }: { slug: string; members: GroupMember[]; canManage: boolean }) {
  const styles = useStyles();
  const { t } = useTranslation('groups');
  const words = useWords();
  // Focus goes back to the Remove button that opened the dialog when it closes (WCAG 2.4.3).
  const restoreFocusTarget = useRestoreFocusTarget();
  const remove = useRemoveMemberMutation(slug);
  const [leaving, setLeaving] = useState<GroupMember | null>(null);
  const showEmail = members.some((m) => m.email !== null);

  return (
    <div className={styles.scroll}>
      <Table aria-label={t('members.label')} size="small">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>{t('members.name')}</TableHeaderCell>
            <TableHeaderCell>{t('members.role')}</TableHeaderCell>
            {showEmail ? <TableHeaderCell>{t('members.email')}</TableHeaderCell> : null}
            {canManage ? <TableHeaderCell>{t('members.takeOut')}</TableHeaderCell> : null}
          </TableRow>
        </TableHeader>
        <TableBody>
          {members.map((m) => (
            <TableRow key={m.userId}>
              <TableCell>{m.displayName}</TableCell>
              <TableCell>{words.groupRole[m.role].title}</TableCell>
              {showEmail ? <TableCell className={styles.email}>{m.email}</TableCell> : null}
              {canManage ? (
                <TableCell>
                  <Button
                    {...restoreFocusTarget}
                    size="small"
                    onClick={() => setLeaving(m)}
                    aria-label={t('members.removeName', { name: m.displayName })}
                  >
                    {t('members.remove')}
                  </Button>
                </TableCell>
              ) : null}
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {remove.isError ? (
        <p className={styles.failure} role="alert">
          {remove.error.message}
        </p>
      ) : null}
      {/* Mounted only while open: a mounted dialog, even closed, makes Fluent's focus manager add
          aria-hidden focusable sentinels to the page (axe-core aria-hidden-focus). */}
      {leaving !== null ? (
        <Dialog open onOpenChange={(_, d) => !d.open && setLeaving(null)}>
          <DialogSurface>
            <DialogBody>
              <DialogTitle>{t('members.confirmTitle', { name: leaving.displayName })}</DialogTitle>
              <DialogContent>{t('members.confirmText')}</DialogContent>
              <DialogActions>
                <Button onClick={() => setLeaving(null)}>{t('members.keep')}</Button>
                <Button
                  appearance="primary"
                  onClick={() => leaving && remove.mutate(leaving.userId, { onSettled: () => setLeaving(null) })}
                >
                  {t('members.remove')}
                </Button>
              </DialogActions>
            </DialogBody>
          </DialogSurface>
        </Dialog>
      ) : null}
    </div>
  );
}
