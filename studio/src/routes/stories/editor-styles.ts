import { makeStyles, tokens } from '@fluentui/react-components';
import { magma } from '../../app/theme';

/** The writing surface: the panel's own headings and lists, and outlines on the blocks a curator selects. */
export const useEditorStyles = makeStyles({
  content: {
    '& .ProseMirror': {
      minHeight: '22rem',
      padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXL}`,
      outline: 'none',
      fontSize: tokens.fontSizeBase400,
      lineHeight: tokens.lineHeightBase400,
    },
    '& .ProseMirror:focus-visible': { boxShadow: `inset 0 0 0 2px ${tokens.colorStrokeFocus2}` },
    // Only a panel with nothing in it shows the hint, not every empty paragraph.
    '& .ProseMirror .is-editor-empty:first-child::before': {
      content: 'attr(data-placeholder)', float: 'inline-start', height: 0, pointerEvents: 'none', color: tokens.colorNeutralForeground3,
    },
    '& .ProseMirror h2': { fontSize: tokens.fontSizeBase600, margin: `${tokens.spacingVerticalM} 0 ${tokens.spacingVerticalS}`, color: tokens.colorBrandForeground2 },
    '& .ProseMirror h3': { fontSize: tokens.fontSizeBase500, margin: `${tokens.spacingVerticalM} 0 ${tokens.spacingVerticalXS}`, color: tokens.colorBrandForeground2 },
    '& .ProseMirror p': { margin: `0 0 ${tokens.spacingVerticalS}` },
    '& .ProseMirror blockquote': { margin: `${tokens.spacingVerticalS} 0`, paddingLeft: tokens.spacingHorizontalL, borderLeft: `3px solid ${tokens.colorNeutralStroke1}` },
    '& .ProseMirror a': { color: tokens.colorBrandForegroundLink },
    '& .mp-widget-node, & .mp-panel-image-node': { margin: `${tokens.spacingVerticalM} 0`, padding: tokens.spacingHorizontalS, borderRadius: tokens.borderRadiusMedium, border: `1px solid ${tokens.colorNeutralStroke2}`, cursor: 'pointer' },
    '& .mp-widget-node[data-selected], & .mp-panel-image-node[data-selected]': { outline: `3px solid ${tokens.colorBrandStroke1}`, outlineOffset: '2px' },
    // A widget being tried shows a setting that is not saved: its frame says so as well as the bar under it.
    '& .mp-widget-node[data-trying]': { border: `1px dashed ${magma.foreground}` },
    '& .mp-widget-trial': { backgroundColor: magma.tint, color: magma.foreground, borderRadius: tokens.borderRadiusMedium, marginTop: tokens.spacingVerticalXS },
    '& .mp-widget-trial button': {
      font: 'inherit',
      minHeight: '32px',
      padding: `0 ${tokens.spacingHorizontalM}`,
      borderRadius: tokens.borderRadiusMedium,
      border: `1px solid ${tokens.colorNeutralStroke1}`,
      backgroundColor: tokens.colorNeutralBackground1,
      color: tokens.colorNeutralForeground1,
      cursor: 'pointer',
    },
    '& .mp-widget-trial button:first-of-type': { backgroundColor: tokens.colorBrandBackground, color: tokens.colorNeutralForegroundOnBrand, border: 'none' },
    '& .mp-widget-trial button:focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
    // The figure's own inline size suits a wall screen; in the editor an image only needs to be recognised.
    '& .mp-panel-image-node img': { maxHeight: '16rem !important', maxWidth: '100%', width: 'auto !important', height: 'auto !important' },
    '& .mp-live-value-node, & .mp-live-phrase-node': {
      padding: `0 ${tokens.spacingHorizontalXXS}`,
      borderRadius: tokens.borderRadiusSmall,
      backgroundColor: magma.tint,
      color: magma.foreground,
      fontWeight: tokens.fontWeightSemibold,
      fontVariantNumeric: 'tabular-nums',
    },
    '& .mp-live-value-node[data-selected], & .mp-live-phrase-node[data-selected]': { outline: `2px solid ${tokens.colorBrandStroke1}` },
    // Following a widget being tried: outlined in dashes, as the widget is.
    '& .mp-live-value-node[data-trying], & .mp-live-phrase-node[data-trying]': { outline: `1px dashed ${magma.foreground}`, outlineOffset: '1px' },
    '& .mp-live-value-node[data-dangling], & .mp-live-phrase-node[data-dangling]': { backgroundColor: tokens.colorPaletteRedBackground2, color: tokens.colorPaletteRedForeground1 },
    // A phrase reads as words, not a number: dotted underline rather than tabular figures.
    '& .mp-live-phrase-node': { fontVariantNumeric: 'normal', textDecoration: `underline dotted ${magma.foreground}` },
    // Words a review comment is about, marked like a highlighter pen over the text.
    '& .mp-comment-anchor': { backgroundColor: tokens.colorPaletteYellowBackground2, borderBottom: `2px solid ${tokens.colorPaletteDarkOrangeBorderActive}` },
  },
});
