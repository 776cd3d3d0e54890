import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { slopeForce } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { WidgetParamsForm } from './WidgetParamsForm';

let latest: Record<string, unknown> = {};

function Harness({ start }: { start: Record<string, unknown> }) {
  const [params, setParams] = useState(start);
  latest = params;
  return <WidgetParamsForm widgetType="slope-force" params={params} onChange={setParams} />;
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
});
