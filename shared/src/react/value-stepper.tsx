import { widgetButtonStyle } from './widget-controls.js';

export interface ValueStepperProps {
  label: string;
  /** The value as the visitor reads it, with its unit. */
  shown: string;
  lessLabel: string;
  moreLabel: string;
  onLess?: () => void;
  onMore?: () => void;
}

/** A button at the end of its range stays in place, faded, so the row does not jump. */
const buttonStyle = (enabled: boolean) => (enabled ? widgetButtonStyle : { ...widgetButtonStyle, opacity: 0.4, cursor: 'default' });

/**
 * A setting a visitor changes with two large buttons either side of its value: targets a finger
 * finds on a kiosk, text that grows with Larger text. A button at the end of the range is disabled.
 */
export function ValueStepper({ label, shown, lessLabel, moreLabel, onLess, onMore }: ValueStepperProps) {
  return (
    <div role="group" aria-label={label} style={{ display: 'flex', alignItems: 'center', gap: '0.5em', flexWrap: 'wrap', margin: '0.4em 0' }}>
      <button type="button" onClick={onLess} disabled={!onLess} aria-label={`${label}: ${lessLabel}`} style={buttonStyle(Boolean(onLess))}>
        <span aria-hidden="true">−</span>
      </button>
      <span style={{ minWidth: '7em', textAlign: 'center' }}>
        <span style={{ display: 'block', fontSize: '0.75em' }}>{label}</span>
        <strong style={{ fontVariantNumeric: 'tabular-nums' }}>{shown}</strong>
      </span>
      <button type="button" onClick={onMore} disabled={!onMore} aria-label={`${label}: ${moreLabel}`} style={buttonStyle(Boolean(onMore))}>
        <span aria-hidden="true">+</span>
      </button>
    </div>
  );
}

/** Steps a value within its range; undefined at the end of the range, which disables the button. */
export function stepWithin(value: number, step: number, min: number, max: number): number | undefined {
  const clamped = Math.min(max, Math.max(min, value + step));
  return clamped === value ? undefined : clamped;
}
