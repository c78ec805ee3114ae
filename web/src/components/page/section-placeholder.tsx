import { makeStyles, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { RouterLink } from '../links/router-link.js';
import { paths } from '../../config/paths.js';
import { ContentCard } from './content-card.js';
import { PageIntro } from './page-intro.js';

const useStyles = makeStyles({
  card: { maxWidth: '68ch' },
  text: { margin: `0 0 ${tokens.spacingVerticalM}` },
});

/** An honest stand-in for a section still being built: what it will do, and that it is not here yet. */
export function SectionPlaceholder({ title, willDo }: { title: string; willDo: string }) {
  const styles = useStyles();
  const { t } = useTranslation();
  return (
    <>
      <PageIntro title={title} />
      <ContentCard className={styles.card}>
        <p className={styles.text}>{willDo}</p>
        <p className={styles.text}>{t('placeholder.notYet')}</p>
        <RouterLink to={paths.home.build()}>{t('placeholder.backHome')}</RouterLink>
      </ContentCard>
    </>
  );
}
