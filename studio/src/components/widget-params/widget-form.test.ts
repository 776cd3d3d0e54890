import { describe, expect, it } from 'vitest';
import { slopeForce, widgetJsonSchema } from '@mantlepiece/shared';
import { issuesByField, parseFieldText, widgetFormGroups, withValueAt } from './widget-form';

describe('the widget side form', () => {
  it('has one input per setting of the slope force box, with label, unit and range from its JSON Schema', () => {
    const [top] = widgetFormGroups(widgetJsonSchema('slope-force'));
    expect(top?.fields.map((field) => field.path.join('.'))).toEqual(['massKg', 'angleDeg', 'staticFriction', 'kineticFriction', 'gravity']);
    expect(top?.fields[1]).toMatchObject({ label: 'Slope angle', unit: '°', min: 0, max: 90, required: true });
    expect(top?.fields[4]).toMatchObject({ required: false });
  });

  it('puts the convection cell’s physical properties in their own optional group and offers grid sizes as choices', () => {
    const groups = widgetFormGroups(widgetJsonSchema('convection-cell'));
    expect(groups[1]).toMatchObject({ path: ['physical'], optional: true });
    expect(groups[0]?.fields.find((field) => field.path[0] === 'nx')).toMatchObject({ kind: 'choice', choices: [16, 32, 64, 128, 256, 512] });
  });

  it('reads typed text as a number, accepts a decimal comma, and leaves other text for validation to refuse', () => {
    expect(parseFieldText('0,6', { kind: 'number' })).toBe(0.6);
    expect(parseFieldText('', { kind: 'number' })).toBeUndefined();
    expect(parseFieldText('lots', { kind: 'number' })).toBe('lots');
    expect(parseFieldText('64', { kind: 'choice', choices: [32, 64] })).toBe(64);
  });

  it('sets and removes nested values without touching the rest', () => {
    expect(withValueAt({ a: 1 }, ['physical', 'depthM'], 2)).toEqual({ a: 1, physical: { depthM: 2 } });
    expect(withValueAt({ a: 1, b: 2 }, ['b'], undefined)).toEqual({ a: 1 });
  });

  it('puts the shared validation’s message on the field it names (kinetic friction above static)', () => {
    const checked = slopeForce.validate({ massKg: 10, angleDeg: 30, staticFriction: 0.5, kineticFriction: 0.7 });
    expect(checked.ok).toBe(false);
    const byField = issuesByField(checked.ok ? [] : checked.errors);
    expect(byField.get('kineticFriction')?.[0]).toMatch(/cannot be more than static friction/);
  });
});
