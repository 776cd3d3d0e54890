import { makeStyles, tokens } from '@fluentui/react-components';

/** The shared rhythm of the studio's forms: one column, fields close, the action set apart. */
export const useFormStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  heading: { margin: 0 },
  intro: { color: tokens.colorNeutralForeground2, margin: 0 },
  actions: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM, flexWrap: 'wrap', marginTop: tokens.spacingVerticalS },
});
