import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState } from '../components/states/index.js';

const useStyles = makeStyles({ root: { padding: tokens.spacingVerticalXXL, maxWidth: '68ch' } });

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  // A deploy replaces the hashed page files; an open tab then asks for ones that are gone.
  if (
    error instanceof TypeError &&
    /dynamically imported module|Importing a module script failed/i.test(error.message)
  ) {
    return 'Homeground was updated since this tab opened. Reload the page to get the new version.';
  }
  return error instanceof Error ? error.message : 'Something unexpected went wrong.';
}

/** Shown in place of a page that crashed or failed to load, with a way out. */
export function RouteErrorPage() {
  const styles = useStyles();
  const error = useRouteError();
  return (
    <div className={styles.root}>
      <PageIntro title="This page did not load" />
      <ErrorState title="Something went wrong." message={describe(error)} />
      <p>
        <Button appearance="primary" onClick={() => window.location.reload()}>
          Reload the page
        </Button>
      </p>
    </div>
  );
}
