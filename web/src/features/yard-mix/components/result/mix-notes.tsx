import { makeStyles, MessageBar, MessageBarBody, MessageBarTitle, tokens } from '@fluentui/react-components';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { useTranslation } from 'react-i18next';
import { useFormatters } from '../../../../lib/i18n/index.js';

const useStyles = makeStyles({
  text: { margin: `0 0 ${tokens.spacingVerticalM}`, maxWidth: '70ch' },
});

/** How the quantities were worked out, and the reminder to check local rules before planting. */
export function MixNotes({ stateName, lossFactor }: { stateName: string; lossFactor: number }) {
  const styles = useStyles();
  const { t } = useTranslation('mix');
  const f = useFormatters();
  return (
    <ContentCard aria-labelledby="mix-notes-heading">
      <Heading level="section" id="mix-notes-heading">
        {t('notes.heading')}
      </Heading>
      <p className={styles.text}>{t('notes.text', { percent: f.number(lossFactor, { style: 'percent' }) })}</p>
      <MessageBar intent="info" layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>{t('notes.checkTitle')}</MessageBarTitle>
          {t('notes.checkText', { state: stateName })}
        </MessageBarBody>
      </MessageBar>
    </ContentCard>
  );
}
