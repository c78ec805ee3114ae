import { RouterButton } from '../../../components/links/router-link.js';
import { ContentCard } from '../../../components/page/content-card.js';
import { PageIntro } from '../../../components/page/page-intro.js';
import { paths } from '../../../config/paths.js';

/** An unknown slug: say so plainly and offer the way back to the whole catalogue. */
export function SpeciesNotFound({ slug }: { slug: string }) {
  return (
    <>
      <PageIntro title="Species not found">
        The catalogue has no species at “{slug}”. The link may have a typo, or the species may have been renamed.
      </PageIntro>
      <ContentCard>
        <RouterButton to={paths.species.build()} appearance="primary">
          Search all species
        </RouterButton>
      </ContentCard>
    </>
  );
}
