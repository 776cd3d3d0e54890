import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen } from '@testing-library/react';
import '../app/i18n';
import { KioskScreens } from './KioskScreens';

const venue = { name: 'Basalt Point Earth Science Centre', locales: ['en', 'fr'] };

describe('kiosk before pairing', () => {
  it('shows the venue name and "touch to begin" in each of its languages', () => {
    render(<KioskScreens venue={venue} />);
    expect(screen.getByText('Basalt Point Earth Science Centre')).toBeTruthy();
    expect(screen.getByText('Touch to begin').getAttribute('lang')).toBe('en');
    expect(screen.getByText('Touchez pour commencer').getAttribute('lang')).toBe('fr');
  });

  it('answers a touch by saying the screen is not paired, and goes back on request', () => {
    render(<KioskScreens venue={venue} />);
    fireEvent.click(screen.getByRole('button', { name: /Touch to begin/ }));
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('Stories are on their way');
    expect(screen.getByText(/not yet paired with a station/)).toBeTruthy();
    expect(screen.getByText(/pas encore associé à un poste/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: /Back/ }));
    expect(screen.getByText('Basalt Point Earth Science Centre')).toBeTruthy();
  });
});
