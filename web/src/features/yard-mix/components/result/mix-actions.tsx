import { useTranslation } from 'react-i18next';
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
  const { t } = useTranslation('yard');
  return (
    <div className={styles.bar} data-print="hide">
      {save}
      <div className={styles.secondary}>
        <CopyLinkButton url={shareUrl} label={t('mix.copyLink')} />
        <Button icon={<ArrowDownload20Regular />} onClick={onExportCsv}>
          {t('mix.exportCsv')}
        </Button>
        <Button icon={<Print20Regular />} onClick={onPrint}>
          {t('mix.print')}
        </Button>
        <RouterButton to={cardsHref} icon={<DocumentBulletList20Regular />}>
          {t('mix.makeCards')}
        </RouterButton>
        {onChangeYard ? (
          <Button appearance="subtle" icon={<Edit20Regular />} onClick={onChangeYard}>
            {t('mix.changeYard')}
          </Button>
        ) : null}
        {onChangeGround ? (
          <Button appearance="subtle" icon={<Location20Regular />} onClick={onChangeGround}>
            {t('mix.changeGround')}
          </Button>
        ) : null}
      </div>
    </div>
  );
}
