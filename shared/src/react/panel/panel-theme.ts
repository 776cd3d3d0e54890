import type { CSSProperties } from 'react';
import { PANEL_COLOURS } from '../../panel/panel-colours.js';

/** Body text size in CSS px at the station's full size; large text is the visitor's switch. */
const BODY_SIZE = { landscape: 34, portrait: 38 } as const;
/** How much the visitor's Larger text switch enlarges the panel's words, and the words drawn in its widgets. */
export const LARGE_TEXT_SCALE = 1.35;
/** Space between the screen's edge and the words, in CSS px at full size. */
const PANEL_PADDING = { landscape: { block: 72, inline: 96 }, portrait: { block: 96, inline: 72 } } as const;

export function panelRootStyle(layout: keyof typeof BODY_SIZE, width: number, height: number, largeText: boolean, highContrast: boolean): CSSProperties {
  const colours = highContrast ? PANEL_COLOURS.highContrast : PANEL_COLOURS.standard;
  return {
    boxSizing: 'border-box',
    width,
    height,
    // A panel longer than its screen scrolls under the visitor's finger rather than losing its end.
    overflowX: 'hidden',
    overflowY: 'auto',
    padding: 'var(--mp-panel-pad-block) var(--mp-panel-pad-inline)',
    ['--mp-panel-pad-block' as string]: `${PANEL_PADDING[layout].block}px`,
    ['--mp-panel-pad-inline' as string]: `${PANEL_PADDING[layout].inline}px`,
    background: colours.surface,
    color: colours.text,
    fontFamily: 'Lexend, system-ui, sans-serif',
    fontSize: BODY_SIZE[layout] * (largeText ? LARGE_TEXT_SCALE : 1),
    lineHeight: 1.45,
    // The words start on their own language's side, whatever the page around aligns: a right-to-left
    // studio hands `text-align: right` down into its dialogs, which pushed an English panel to the right.
    textAlign: 'start',
    ['--mp-heading' as string]: colours.heading,
    ['--mp-link' as string]: colours.link,
    ['--mp-live-value' as string]: colours.liveValue,
    ['--mp-surface' as string]: colours.surface,
    ['--mp-control-surface' as string]: colours.control,
    ['--mp-control-text' as string]: colours.controlText,
    ['--mp-control-border' as string]: colours.controlBorder,
  };
}

/** Gap between the words and the pictures on a landscape screen, in CSS px. */
const COLUMN_GAP = 64;

/** Widest a widget is drawn on each screen, in CSS px: a portrait screen's full text width, a landscape one's media column. */
export const WIDGET_MAX_WIDTH = { landscape: (1920 - 2 * 96 - COLUMN_GAP) / 2, portrait: 936 } as const;

export const landscapeColumnStyle = {
  row: { display: 'flex', gap: COLUMN_GAP, alignItems: 'flex-start' },
  text: { flex: '1 1 0', minWidth: 0 },
  media: { flex: '1 1 0', minWidth: 0, display: 'flex', flexDirection: 'column', gap: 32 },
} satisfies Record<string, CSSProperties>;
