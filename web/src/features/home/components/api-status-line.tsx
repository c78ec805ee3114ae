import { makeStyles, tokens } from '@fluentui/react-components';
import { useQuery } from '@tanstack/react-query';
import { healthQueryOptions } from '../../../api/system/system.queries.js';
import { hgTokens } from '../../../theme/index.js';

const useStyles = makeStyles({
  line: { margin: 0, fontSize: tokens.fontSizeBase200, color: hgTokens.hgColorLoam },
  warning: { color: tokens.colorStatusWarningForeground1 },
});

/** A small line with the API version, and a calm note when the database is not answering. */
export function ApiStatusLine() {
  const styles = useStyles();
  const health = useQuery(healthQueryOptions());
  if (health.isPending) return <p className={styles.line}>Checking the API…</p>;
  if (health.isError)
    return <p className={styles.line}>The API did not answer its health check: {health.error.message}</p>;
  const { version, database } = health.data;
  return (
    <p className={styles.line}>
      Homeground API version {version}.
      {database.status === 'down' ? (
        <span className={styles.warning}> The catalogue database is not answering, so figures may be out of date.</span>
      ) : null}
    </p>
  );
}
