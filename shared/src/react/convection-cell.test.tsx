// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { convectionCell } from '../widgets/convection-cell/index.js';
import { ConvectionCell } from './convection-cell.js';

afterEach(cleanup);

const params = { ...convectionCell.defaults, nx: 32 as const, nz: 32 as const };

describe('ConvectionCell', () => {
  it('is an image described by the widget’s description and the live readouts', () => {
    render(<ConvectionCell params={params} locale="en" reducedMotion />);
    const picture = screen.getByRole('img', { name: 'Convection cell' });
    const description = document.getElementById(picture.getAttribute('aria-describedby')!)!.textContent;
    expect(description).toContain('Its Rayleigh number is 10,000');
    expect(description).toContain('Now: heat carried');
  });

  it('in reduced motion, does not play by itself and steps the solver when asked, moving the time readout on', async () => {
    const { container } = render(<ConvectionCell params={params} locale="en" reducedMotion />);
    expect(screen.queryByRole('button', { name: 'Pause' })).toBeNull();
    const time = () => container.querySelector('[data-readout="time"]')!.textContent;
    await waitFor(() => expect(time()).toBe('0'));
    fireEvent.click(screen.getByRole('button', { name: 'Step forward' }));
    await waitFor(() => expect(Number(time())).toBeGreaterThan(0));
  });

  it('offers pause while it plays, and step once paused', () => {
    render(<ConvectionCell params={params} locale="en" reducedMotion={false} />);
    fireEvent.click(screen.getByRole('button', { name: 'Pause' }));
    expect(screen.getByRole('button', { name: 'Play' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Step forward' })).toBeTruthy();
  });

  it('labels its readouts in French and in physical units when set', () => {
    const physical = { densityKgM3: 3300, gravityMs2: 9.8, expansivityPerK: 3e-5, deltaTK: 1300, depthM: 660e3, diffusivityM2s: 1e-6, viscosityPas: 1e21 };
    render(<ConvectionCell params={{ ...params, rayleigh: undefined, physical, units: 'physical', nx: 128, nz: 128 }} locale="fr" reducedMotion showCaution />);
    expect(screen.getByText('Temps (millions d’années)')).toBeTruthy();
    expect(screen.getByText('Chaleur transportée (Nu)')).toBeTruthy();
    expect(screen.getByRole('note').textContent).toMatch(/^Modèle pédagogique simplifié/);
  });
});
