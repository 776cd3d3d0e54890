// @vitest-environment jsdom
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { criticalAngleDeg } from '../widgets/slope-force/index.js';
import { SlopeForceBox } from './slope-force-box.js';

const params = { massKg: 10, angleDeg: 38, staticFriction: 0.85, kineticFriction: 0.6 };

afterEach(cleanup);

describe('SlopeForceBox', () => {
  it('is a keyboard slider for the slope angle, described by the widget’s own description', () => {
    render(<SlopeForceBox params={params} locale="en" />);
    const slider = screen.getByRole('slider', { name: 'Slope force box: Slope angle' });
    expect(slider.getAttribute('aria-valuenow')).toBe('38');
    expect(slider.getAttribute('aria-valuetext')).toBe('38°, Holds');
    expect(slider.getAttribute('tabindex')).toBe('0');
    const describedBy = slider.getAttribute('aria-describedby')!.split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(describedBy[1]).toContain('so the block holds still');
  });

  it('switches from "Holds" to "Slides" in words, not colour alone, when the arrow keys tilt it past arctan 0.85 ≈ 40.36°', () => {
    const changes: number[] = [];
    render(<SlopeForceBox params={params} locale="en" reducedMotion onParamsChange={(next) => changes.push(next.angleDeg)} />);
    const slider = screen.getByRole('slider');
    expect(screen.getByRole('status').textContent).toContain('Holds');
    fireEvent.keyDown(slider, { key: 'ArrowUp' });
    fireEvent.keyDown(slider, { key: 'ArrowUp' });
    expect(criticalAngleDeg(0.85)).toBeGreaterThan(40);
    expect(screen.getByRole('status').textContent).toContain('Holds');
    fireEvent.keyDown(slider, { key: 'ArrowUp' });
    expect(screen.getByRole('status').textContent).toContain('Slides');
    expect(changes).toEqual([39, 40, 41]);
  });

  it('takes Home, End and page keys, and stays within 0° to 90°', () => {
    render(<SlopeForceBox params={params} locale="en" />);
    const slider = screen.getByRole('slider');
    fireEvent.keyDown(slider, { key: 'End' });
    expect(slider.getAttribute('aria-valuenow')).toBe('90');
    fireEvent.keyDown(slider, { key: 'PageUp' });
    expect(slider.getAttribute('aria-valuenow')).toBe('90');
    fireEvent.keyDown(slider, { key: 'Home' });
    fireEvent.keyDown(slider, { key: 'ArrowDown' });
    expect(slider.getAttribute('aria-valuenow')).toBe('0');
  });

  it('names each force arrow with its value in newtons in the key below the drawing, and the critical angle on the drawing', () => {
    const { container } = render(<SlopeForceBox params={params} locale="en" />);
    const key = [...container.querySelectorAll('.mp-slope-forces li')].map((item) => item.textContent);
    // W = m·g0 = 10 kg × 9.80665 m/s² = 98.1 N; N = W·cos 38° = 77.3 N; S = W·sin 38° = 60.4 N (textbook statics, 3 significant digits).
    expect(key).toEqual(['Weight 98.1\u00a0N', 'Presses into slope 77.3\u00a0N', 'Pulls down slope 60.4\u00a0N', 'Friction 60.4\u00a0N']);
    const labels = [...container.querySelectorAll('svg text')].map((text) => text.textContent);
    // arctan 0.85 = 40.36°; numbers are wrapped in left-to-right isolates (U+2066 … U+2069) so they read in order in Arabic too.
    expect(labels).toContain('Starts to slide at \u206640.4°\u2069');
    expect(labels).toContain('\u206638°\u2069');
  });

  it('rounds the critical angle as the live value on its panel does, when the panel shows one', () => {
    const { container } = render(<SlopeForceBox params={params} locale="en" outputDigits={{ criticalAngleDeg: 2 }} />);
    expect([...container.querySelectorAll('svg text')].map((text) => text.textContent)).toContain('Starts to slide at \u206640°\u2069');
  });

  it('tells a kiosk visitor to drag with a finger, not to use arrow keys', () => {
    render(<SlopeForceBox params={params} locale="en" input="touch" />);
    expect(screen.getByText('Drag the slope up or down with your finger to change its tilt.')).toBeTruthy();
    expect(screen.queryByText(/arrow keys/)).toBeNull();
  });

  it('in reduced motion, moves a sliding block by steps the visitor asks for, then offers to put it back', () => {
    render(<SlopeForceBox params={{ ...params, angleDeg: 60 }} locale="en" reducedMotion />);
    act(() => screen.getByRole('button', { name: 'Step forward' }).click());
    const putBack = screen.getByRole('button', { name: 'Put the block back' });
    // Kiosk controls: at least 64 CSS px once the kiosk scales a panel down (96 at full size). Their text follows the panel's size (the kiosk browser test measures it).
    expect(putBack.style.minHeight).toBe('96px');
    expect(putBack.style.minWidth).toBe('96px');
  });

  it('speaks French and shows the caution when asked', () => {
    render(<SlopeForceBox params={params} locale="fr" showCaution />);
    expect(screen.getByRole('status').textContent).toContain('Tient');
    expect(screen.getByRole('note').textContent).toMatch(/^Modèle pédagogique simplifié/);
  });
});
