import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';

/** Someone in no growing group: say plainly what the page is for and how to get a season plan. */
export function NoSeasonGroup() {
  return (
    <>
      <PageIntro title="Season plan" />
      <ContentCard aria-label="No growing group">
        <p>
          The season plan belongs to a community growing group: its organisers choose the species and targets and work
          out the seed list, and its growers and members can read it here. You are not in a growing group yet. An
          organiser can invite you by e-mail.
        </p>
      </ContentCard>
    </>
  );
}
