import { useEffect, useState } from 'react';
import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { convectionCell, slopeForce, type WidgetType } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { WidgetParamsForm } from './WidgetParamsForm';

let latest: Record<string, unknown> = {};

function Harness({ start, widgetType = 'slope-force' }: { start: Record<string, unknown>; widgetType?: WidgetType }) {
  const [params, setParams] = useState(start);
  useEffect(() => {
    latest = params;
  });
  return <WidgetParamsForm widgetType={widgetType} params={params} onChange={setParams} />;
}

const describedText = (input: HTMLElement) =>
  (input.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent ?? '').join(' ');

describe('the widget params form', () => {
  it('reads a decimal comma as a number and keeps what was typed in the box', async () => {
    await renderInStudio(<Harness start={{ ...slopeForce.defaults }} />);
    const kinetic = screen.getByRole('textbox', { name: /^Kinetic \(sliding\) friction/ });
    fireEvent.change(kinetic, { target: { value: '0,4' } });
    expect(latest.kineticFriction).toBe(0.4);
    expect((kinetic as HTMLInputElement).value).toBe('0,4');
  });

  it('puts the shared validation’s message under the field it names (kinetic friction above static)', async () => {
    await renderInStudio(<Harness start={{ ...slopeForce.defaults, staticFriction: 0.5 }} />);
    const kinetic = screen.getByRole('textbox', { name: /^Kinetic \(sliding\) friction/ });
    fireEvent.change(kinetic, { target: { value: '0.7' } });
    expect(kinetic.getAttribute('aria-invalid')).toBe('true');
    expect(describedText(kinetic)).toMatch(/cannot be more than static friction/);
  });

  it('starts a convection cell switched to physical properties from typical upper-mantle values, each with its source, and no errors', async () => {
    await renderInStudio(<Harness widgetType="convection-cell" start={{ ...convectionCell.defaults }} />);
    fireEvent.click(screen.getByRole('switch', { name: 'Set these' }));
    expect(convectionCell.validate(latest).ok).toBe(true);
    expect(latest).toMatchObject({ physical: { densityKgM3: 3300, viscosityPas: 1e21 }, units: 'physical' });
    expect(latest.rayleigh).toBeUndefined();
    expect(document.querySelectorAll('[aria-invalid="true"]')).toHaveLength(0);
    const viscosity = screen.getByRole('textbox', { name: /^Viscosity/ });
    expect(describedText(viscosity)).toMatch(/common practice, no source/);
    expect(describedText(screen.getByRole('textbox', { name: /^Density/ }))).toMatch(/Turcotte and Schubert, Geodynamics/);
  });
  it('names each setting and choice in the studio’s language, from the shared widget strings', async () => {
    await renderInStudio(<Harness widgetType="convection-cell" start={{ ...convectionCell.defaults }} />, { language: 'fr' });
    // The French words of shared/src/i18n/fr.ts; the schema's English titles must not show.
    expect(screen.getByRole('textbox', { name: /^Nombre de Rayleigh Ra/ })).toBeTruthy();
    expect(screen.getByRole('group', { name: /^Propriétés physiques/ })).toBeTruthy();
    const overlay = screen.getByRole('combobox', { name: /^Surcouche/ });
    expect([...overlay.querySelectorAll('option')].map((option) => option.textContent)).toEqual(['Lignes de courant', 'Particules à la dérive', 'Flèches d’écoulement', 'Aucune surcouche']);
    expect(screen.queryByText('Rayleigh number Ra')).toBeNull();
  });
});
