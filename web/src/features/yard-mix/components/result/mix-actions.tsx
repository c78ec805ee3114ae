import { Button, makeStyles, tokens } from '@fluentui/react-components';
import {
  ArrowDownload20Regular,
  DocumentBulletList20Regular,
  Edit20Regular,
  Location20Regular,
  Print20Regular,
} from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { RouterButton } from '../../../../components/links/router-link.js';
import { CopyLinkButton } from './share-link.js';

const useStyles = makeStyles({
  bar: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, alignItems: 'flex-start' },
  secondary: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS, alignItems: 'flex-start' },
});

export interface MixActionsProps {
  /** The primary action (save, or sign in to save). */
  save: ReactNode;
  shareUrl: string;
  cardsHref: string;
  onExportCsv: () => void;
  onPrint: () => void;
  onChangeYard?: () => void;
  onChangeGround?: () => void;
}

/** Save first; sharing, files and printing as quieter buttons beside it. */
export function MixActions({
  save,
  shareUrl,
  cardsHref,
  onExportCsv,
  onPrint,
  onChangeYard,
  onChangeGround,
}: MixActionsProps) {
  const styles = useStyles();
  return (
    <div className={styles.bar} data-print="hide">
      {save}
      <div className={styles.secondary}>
        <CopyLinkButton url={shareUrl} label="Copy link to this mix" />
        <Button icon={<ArrowDownload20Regular />} onClick={onExportCsv}>
          Export CSV
        </Button>
        <Button icon={<Print20Regular />} onClick={onPrint}>
          Print
        </Button>
        <RouterButton to={cardsHref} icon={<DocumentBulletList20Regular />}>
          Make fact cards for this mix
        </RouterButton>
        {onChangeYard ? (
          <Button appearance="subtle" icon={<Edit20Regular />} onClick={onChangeYard}>
            Change your yard
          </Button>
        ) : null}
        {onChangeGround ? (
          <Button appearance="subtle" icon={<Location20Regular />} onClick={onChangeGround}>
            Change your ground
          </Button>
        ) : null}
      </div>
    </div>
  );
}
