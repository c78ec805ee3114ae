import { makeStyles, tokens } from '@fluentui/react-components';

export const useYardFormStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXL, maxWidth: '720px' },
  group: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalL,
    border: 'none',
    margin: 0,
    padding: 0,
    minWidth: 0,
  },
  legend: {
    fontWeight: tokens.fontWeightSemibold,
    fontSize: tokens.fontSizeBase400,
    padding: 0,
    marginBottom: tokens.spacingVerticalS,
  },
  groupLabel: { margin: `0 0 ${tokens.spacingVerticalXS}`, fontWeight: tokens.fontWeightSemibold },
  goals: {
    display: 'grid',
    gap: tokens.spacingVerticalXS,
    gridTemplateColumns: 'repeat(auto-fill, minmax(260px, 1fr))',
  },
  goalLine: { display: 'block', color: tokens.colorNeutralForeground2, fontSize: tokens.fontSizeBase200 },
  goalName: { fontWeight: tokens.fontWeightSemibold },
  // A two-line label: the box sits beside its first line, not between the two.
  goal: { alignItems: 'flex-start' },
  goalIndicator: { alignSelf: 'flex-start', marginTop: '10px' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalM, flexWrap: 'wrap', alignItems: 'center' },
});
