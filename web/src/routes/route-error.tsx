import type { TFunction } from 'i18next';
import { Button, makeStyles, tokens } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { PageIntro } from '../components/page/page-intro.js';
import { ErrorState } from '../components/states/index.js';

const useStyles = makeStyles({ root: { padding: tokens.spacingVerticalXXL, maxWidth: '68ch' } });

function describe(error: unknown, t: TFunction): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  // A deploy replaces the hashed page files; an open tab then asks for ones that are gone.
  if (
    error instanceof TypeError &&
    /dynamically imported module|Importing a module script failed/i.test(error.message)
  ) {
    return t('routeError.updated');
  }
  return error instanceof Error ? error.message : t('routeError.unexpected');
}

/** Shown in place of a page that crashed or failed to load, with a way out. */
export function RouteErrorPage() {
  const styles = useStyles();
  const { t } = useTranslation();
  const error = useRouteError();
  return (
    <div className={styles.root}>
      <PageIntro title={t('routeError.title')} />
      <ErrorState title={t('routeError.somethingWrong')} message={describe(error, t)} />
      <p>
        <Button appearance="primary" onClick={() => window.location.reload()}>
          {t('routeError.reload')}
        </Button>
      </p>
    </div>
  );
}
