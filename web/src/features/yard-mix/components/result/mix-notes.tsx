import { makeStyles, MessageBar, MessageBarBody, MessageBarTitle, tokens } from '@fluentui/react-components';
import { ContentCard } from '../../../../components/page/content-card.js';
import { Heading } from '../../../../components/page/page-heading.js';
import { lossFactorWords } from '../../utils/quantity-words.js';

const useStyles = makeStyles({
  text: { margin: `0 0 ${tokens.spacingVerticalM}`, maxWidth: '70ch' },
});

/** How the quantities were worked out, and the reminder to check local rules before planting. */
export function MixNotes({ stateName, lossFactor }: { stateName: string; lossFactor: number }) {
  const styles = useStyles();
  return (
    <ContentCard aria-labelledby="mix-notes-heading">
      <Heading level="section" id="mix-notes-heading">
        Before you sow and plant
      </Heading>
      <p className={styles.text}>
        Plant numbers fill the area at each species' spacing, in groups of the same species.{' '}
        {lossFactorWords(lossFactor)} Where a seed weight is not known, ask your seed supplier for the count per packet.
      </p>
      <MessageBar intent="info" layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>Check local rules</MessageBarTitle>
          Look up {stateName}'s noxious-weed list and any town, county or homeowners' association rules on plant height
          and “weeds” before you plant. Native species are rarely listed, but rules differ from place to place. Buy seed
          or plants from a nursery; never dig plants from the wild.
        </MessageBarBody>
      </MessageBar>
    </ContentCard>
  );
}
