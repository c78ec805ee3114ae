import { useTranslation } from 'react-i18next';
import { makeStyles, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { healthQueryOptions } from '../../../api/system/system.queries.js';

const useStyles = makeStyles({
  note: { margin: 0, fontSize: tokens.fontSizeBase200, color: tokens.colorStatusWarningForeground1 },
});

/**
 * A calm note when the catalogue's database is not answering; nothing otherwise. The API's version
 * stays in GET /api/health for the people who run Homeground, not on the home page.
 */
export function CatalogueStatusNote() {
  const styles = useStyles();
  const { t } = useTranslation('home');
  const health = useQuery(healthQueryOptions());
  if (health.data?.database.status !== 'down') return null;
  return (
    <p className={styles.note} role="status">
      {t('figures.down')}
    </p>
  );
}
