import { describe, expect, it } from 'vitest';
import { checkWidget, describeWidgetTypes, WIDGET_TYPES, widgetJsonSchema, widgetRegistry } from './registry.js';

describe('widget registry', () => {
  it('lists the slope force box, the convection cell, sea-floor depth and plate forces by type', () => {
    expect(WIDGET_TYPES).toEqual(['slope-force', 'convection-cell', 'sea-floor-depth', 'plate-forces']);
    for (const type of WIDGET_TYPES) expect(widgetRegistry[type].type).toBe(type);
  });

  it('gives each type a JSON Schema with titles and units from the zod schema, and defaults that validate', () => {
    for (const descriptor of describeWidgetTypes()) {
      expect(descriptor.jsonSchema.type).toBe('object');
      expect(widgetRegistry[descriptor.type].validate(descriptor.defaults).ok).toBe(true);
    }
    const slope = widgetJsonSchema('slope-force') as { title: string; required: string[]; properties: Record<string, Record<string, unknown>> };
    expect(slope.title).toBe('Slope force box');
    expect(slope.required).toEqual(['massKg', 'angleDeg', 'staticFriction', 'kineticFriction']);
    expect(slope.properties.massKg).toMatchObject({ type: 'number', exclusiveMinimum: 0, maximum: 1e6, unit: 'kg', title: 'Mass' });
    const convection = widgetJsonSchema('convection-cell') as { properties: Record<string, Record<string, unknown>> };
    expect(convection.properties.nx).toMatchObject({ enum: [16, 32, 64, 128, 256, 512] });
    expect(convection.properties.overlay).toMatchObject({ enum: ['streamlines', 'particles', 'arrows', 'none'] });
  });

  it('gives each type its model card', () => {
    for (const descriptor of describeWidgetTypes()) expect(descriptor.model).toBe(widgetRegistry[descriptor.type].model);
  });

  it('checks params for a type and returns the computed result with any model-limit warnings', () => {
    const check = checkWidget('slope-force', { massKg: 1, angleDeg: 45, staticFriction: 0, kineticFriction: 0 });
    expect(check.ok).toBe(true);
    if (check.ok) {
      expect(check.result).toMatchObject({ slides: true });
      expect(check.warnings.map((warning) => warning.code)).toEqual(['frictionless']);
    }
  });

  it('prefixes param errors with "params" so they locate the field in the request', () => {
    expect(checkWidget('slope-force', { massKg: 1, angleDeg: 91, staticFriction: 0.5, kineticFriction: 0.5 })).toEqual({
      ok: false,
      errors: [{ path: ['params', 'angleDeg'], message: 'Slope angle must be a number from 0° to 90°.' }],
    });
  });

  it('refuses an unknown type, naming the known ones', () => {
    expect(checkWidget('slab-pull', {})).toEqual({
      ok: false,
      errors: [{ path: ['type'], message: 'Unknown widget type "slab-pull"; the known types are slope-force, convection-cell, sea-floor-depth, plate-forces.' }],
    });
    expect(checkWidget('constructor', {}).ok).toBe(false);
  });
});
