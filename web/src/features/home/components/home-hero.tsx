import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { ArrowRight20Regular } from '@fluentui/react-icons';
import { RouterButton } from '../../../components/links/router-link.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { paths } from '../../../config/paths.js';

const useStyles = makeStyles({
  hero: { marginBottom: tokens.spacingVerticalXXXL },
});

/** What Homeground does, in one breath, and the screen's one primary action. */
export function HomeHero() {
  const styles = useStyles();
  const { t } = useTranslation('home');
  return (
    <div className={styles.hero}>
      <PageIntro title={t('hero.title')}>{t('hero.intro')}</PageIntro>
      <RouterButton to={paths.findPlants.build()} appearance="primary" size="large" icon={<ArrowRight20Regular />}>
        {t('hero.action')}
      </RouterButton>
    </div>
  );
}
