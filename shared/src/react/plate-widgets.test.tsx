// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { PlateForces } from './plate-forces.js';
import { SeaFloorDepth } from './sea-floor-depth.js';

afterEach(cleanup);

describe('SeaFloorDepth', () => {
  it('is a keyboard slider for the age, and reads out depth, heat flow and thickness of the chosen model', () => {
    const ages: number[] = [];
    render(<SeaFloorDepth params={{ ageMyr: 50, model: 'plate' }} locale="en" onParamsChange={(next) => ages.push(next.ageMyr)} />);
    const slider = screen.getByRole('slider', { name: 'Sea-floor depth: Age of the sea floor' });
    expect(slider.getAttribute('aria-valuenow')).toBe('50');
    // GDH1 at 50 Myr: 5651 − 2473·e^(−1.39) = 5035 m (Stein and Stein 1992).
    expect(screen.getByRole('status').querySelector('[data-readout="depth"]')?.textContent).toBe('5.04\u00a0km');
    fireEvent.keyDown(slider, { key: 'ArrowRight' });
    fireEvent.keyDown(slider, { key: 'End' });
    expect(ages).toEqual([51, 200]);
  });

  it('changes age with large buttons and switches model, the chosen one pressed', () => {
    const changes: unknown[] = [];
    render(<SeaFloorDepth params={{ ageMyr: 50, model: 'plate' }} locale="en" onParamsChange={(next) => changes.push(next)} />);
    fireEvent.click(screen.getByRole('button', { name: 'Age of the sea floor: Older' }));
    fireEvent.click(screen.getByRole('button', { name: 'Half-space model' }));
    expect(changes).toEqual([{ ageMyr: 55, model: 'plate' }, { ageMyr: 55, model: 'half-space' }]);
    expect(screen.getByRole('button', { name: 'Half-space model' }).getAttribute('aria-pressed')).toBe('true');
    // Half-space at 55 Myr: 2500 + 354.697·√55 = 5130.5 m (Turcotte and Schubert).
    expect(screen.getByRole('status').querySelector('[data-readout="depth"]')?.textContent).toBe('5.13\u00a0km');
  });
});

describe('PlateForces', () => {
  it('shows both forces to scale, says which is bigger, and carries its cautions', () => {
    render(<PlateForces params={{ ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60 }} locale="en" />);
    const status = screen.getByRole('status');
    expect(status.getAttribute('data-state')).toBe('slab-pull-dominates');
    expect(status.textContent).toContain('Slab pull is 14 times ridge push.');
    expect(screen.getByRole('note').textContent).toMatch(/order-of-magnitude teaching estimates.*resistance balances much of the slab’s pull.*phase/);
    expect(screen.getByText(/^Holding them back:/)).toBeTruthy();
  });

  it('lets ridge push win once the slab is short enough (at 100 Myr, under about 52 km)', () => {
    const lengths: number[] = [];
    render(<PlateForces params={{ ageMyr: 100, slabLengthKm: 100, slabDipDeg: 60 }} locale="en" onParamsChange={(next) => lengths.push(next.slabLengthKm)} />);
    const slider = screen.getByRole('slider', { name: 'Plate forces: Length of the sinking slab' });
    fireEvent.keyDown(slider, { key: 'ArrowDown' });
    expect(lengths).toEqual([50]);
    expect(screen.getByRole('status').getAttribute('data-state')).toBe('ridge-push-dominates');
    fireEvent.click(screen.getByRole('button', { name: 'Length of the sinking slab: More' }));
    expect(lengths).toEqual([50, 150]);
  });
});
