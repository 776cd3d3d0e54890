import type { CSSProperties } from 'react';

/**
 * A widget's buttons (Play, Pause, Step forward, Put the block back) as kiosk controls: text at the
 * panel's size, so they grow with Larger text, colours from the panel's theme, so they follow High
 * contrast, and targets of 96 px at the station's full size. The kiosk draws a panel scaled down to
 * its stage (never below about 0.7 of full size), so that stays above 64 CSS px on the glass.
 */
const WIDGET_CONTROL_SIZE = 96;

export const widgetButtonStyle: CSSProperties = {
  minHeight: WIDGET_CONTROL_SIZE,
  minWidth: WIDGET_CONTROL_SIZE,
  padding: '0.2em 1.1em',
  font: 'inherit',
  fontWeight: 600,
  lineHeight: 1.2,
  borderRadius: 999,
  border: '4px solid var(--mp-control-border, #0b3f5c)',
  background: 'var(--mp-control-surface, #0b3f5c)',
  color: 'var(--mp-control-text, #ffffff)',
  cursor: 'pointer',
  touchAction: 'manipulation',
};

export const widgetControlRowStyle: CSSProperties = { display: 'flex', flexWrap: 'wrap', gap: '0.5em', marginTop: '0.5em' };

/** Text that a widget says about how to move it: a finger on a kiosk, a mouse or the keys at a desk. */
export type WidgetInput = 'touch' | 'desk';
