import { makeStyles, Spinner, tokens } from '@fluentui/react-components';

const useStyles = makeStyles({
  root: { display: 'flex', justifyContent: 'center', padding: `${tokens.spacingVerticalXXXL} 0` },
});

/** A spinner with words, so a screen reader hears what is loading. */
export function LoadingState({ label }: { label: string }) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <Spinner size="medium" label={label} labelPosition="below" />
    </div>
  );
}
