import { makeStyles, tokens } from '@fluentui/react-components';

/** Pieces of the review pages that several components draw the same way. */
export const useReviewStyles = makeStyles({
  visuallyHidden: {
    position: 'absolute',
    width: '1px',
    height: '1px',
    padding: 0,
    margin: '-1px',
    overflow: 'hidden',
    clip: 'rect(0 0 0 0)',
    whiteSpace: 'nowrap',
    border: 0,
  },
  card: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingHorizontalL,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusLarge,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  heading: { margin: 0 },
  muted: { color: tokens.colorNeutralForeground3 },
  hash: { fontFamily: tokens.fontFamilyMonospace, fontSize: tokens.fontSizeBase200 },
});
