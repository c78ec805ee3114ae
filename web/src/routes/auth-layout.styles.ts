import { makeStyles, tokens } from '@fluentui/react-components';

/** Sign-in and register: a narrow column that still fits a 360 px phone. */
export const useAuthPageStyles = makeStyles({
  column: { maxWidth: '440px', margin: '0 auto' },
  switch: { marginTop: tokens.spacingVerticalL },
});
