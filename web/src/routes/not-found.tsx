import { RouterButton } from '../components/links/router-link.js';
import { ContentCard } from '../components/page/content-card.js';
import { PageIntro } from '../components/page/page-intro.js';
import { paths } from '../config/paths.js';
import { useDocumentTitle } from '../lib/use-document-title.js';

export function NotFoundRoute() {
  useDocumentTitle('Page not found');
  return (
    <>
      <PageIntro title="Page not found">
        There is no page at this address. It may have moved, or the link has a typo.
      </PageIntro>
      <ContentCard>
        <RouterButton to={paths.home.build()} appearance="primary">
          Go to the home page
        </RouterButton>
      </ContentCard>
    </>
  );
}
