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
  return (
    <div className={styles.hero}>
      <PageIntro title="Grow the native plants that belong to your ground">
        Homeground helps community growing groups choose the native plants of their ecoregion, grow them from seed over
        winter, and share them with neighbours in spring.
      </PageIntro>
      <RouterButton to={paths.findPlants.build()} appearance="primary" size="large" icon={<ArrowRight20Regular />}>
        Find plants for your ground
      </RouterButton>
    </div>
  );
}
