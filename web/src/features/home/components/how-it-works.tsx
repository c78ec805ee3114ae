import { makeStyles, tokens } from '@fluentui/react-components';
import { ContentCard } from '../../../components/page/content-card.js';
import { Heading } from '../../../components/page/page-heading.js';

const STEPS = [
  {
    title: 'Choose',
    text: 'Tell Homeground where your ground is: state, county or ecoregion. It suggests a yard mix of native plants that grow there, with something in bloom from spring to frost, and says why each one fits.',
  },
  {
    title: 'Grow',
    text: 'Many native seeds need cold-moist stratification: a few weeks of cold, damp rest before they sprout. Homeground counts sowing dates back from your last spring frost, whether you winter-sow outdoors or start trays under lights.',
  },
  {
    title: 'Share',
    text: 'Your group hands the plants on at a plant share. Neighbours make a reservation and choose a pickup slot, so nobody waits in a long line and every plant finds a yard.',
  },
] as const;

const useStyles = makeStyles({
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fit, minmax(260px, 1fr))',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalXXXL,
  },
  text: { margin: 0, lineHeight: tokens.lineHeightBase400 },
});

export function HowItWorks() {
  const styles = useStyles();
  return (
    <section aria-labelledby="how-it-works">
      <Heading level="section" id="how-it-works">
        From seed to neighbour
      </Heading>
      <div className={styles.grid}>
        {STEPS.map((step) => (
          <ContentCard key={step.title} as="article">
            <Heading level="card">{step.title}</Heading>
            <p className={styles.text}>{step.text}</p>
          </ContentCard>
        ))}
      </div>
    </section>
  );
}
