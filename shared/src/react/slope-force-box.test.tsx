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

  it('labels each force arrow with its value in newtons, to scale', () => {
    const { container } = render(<SlopeForceBox params={params} locale="en" />);
    const labels = [...container.querySelectorAll('text')].map((text) => text.textContent);
    expect(labels).toContain('Weight 98.1\u00a0N');
    expect(labels).toContain('Presses into slope 77.3\u00a0N');
    expect(labels).toContain('Pulls down slope 60.4\u00a0N');
    expect(labels).toContain('Starts to slide at 40.4°');
  });

  it('in reduced motion, moves a sliding block by steps the visitor asks for, then offers to put it back', () => {
    render(<SlopeForceBox params={{ ...params, angleDeg: 60 }} locale="en" reducedMotion />);
    act(() => screen.getByRole('button', { name: 'Step forward' }).click());
    expect(screen.getByRole('button', { name: 'Put the block back' })).toBeTruthy();
  });

  it('speaks French and shows the caution when asked', () => {
    render(<SlopeForceBox params={params} locale="fr" showCaution />);
    expect(screen.getByRole('status').textContent).toContain('Tient');
    expect(screen.getByRole('note').textContent).toMatch(/^Modèle pédagogique simplifié/);
  });
});
