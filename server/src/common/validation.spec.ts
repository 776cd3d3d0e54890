import { plainToInstance } from 'class-transformer';
import { IsOptional, validateSync } from 'class-validator';
import { describe, expect, it } from 'vitest';
import { ID_MAX, IsRowId, malformedText, Omittable, PatchType, QueryRowId } from './validation.js';

class Parent {
  @Omittable()
  @IsRowId()
  venueId?: number;

  @IsOptional()
  @IsRowId()
  exhibitId?: number | null;
}

class Patch extends PatchType(Parent) {}

class Filter {
  @QueryRowId()
  galleryId: number;
}

const problems = (cls: new () => object, plain: object) => validateSync(plainToInstance(cls, plain)).map((e) => e.property);

describe('shared field rules', () => {
  it('bounds a row id by the id range', () => {
    expect(problems(Parent, { venueId: ID_MAX })).toEqual([]);
    for (const venueId of [0, ID_MAX + 1, 2 ** 53, 1e308, 1.5, '1']) expect(problems(Parent, { venueId })).toEqual(['venueId']);
  });

  it('takes a field left out, refuses null unless the field is one null clears, also in a PATCH body', () => {
    for (const cls of [Parent, Patch]) {
      expect(problems(cls, {})).toEqual([]);
      expect(problems(cls, { venueId: null })).toEqual(['venueId']);
      expect(problems(cls, { exhibitId: null })).toEqual([]);
    }
  });

  it('reads a query integer from decimal digits only', () => {
    expect(plainToInstance(Filter, { galleryId: '12' }).galleryId).toBe(12);
    for (const galleryId of ['1e3', '0x10', ' 1', '', '99999999999999999999', '1.0']) expect(problems(Filter, { galleryId })).toEqual(['galleryId']);
  });
});

describe('malformedText', () => {
  it('finds lone surrogates in values and keys, with their paths, and lets pairs through', () => {
    expect(malformedText({ title: 'Lava 🌋', tags: ['ok', 'bad\ud800'], '\udc00': 1 })).toEqual([
      { path: ['tags', 1], message: expect.stringMatching(/well-formed Unicode/) },
      { path: ['\ufffd'], message: expect.stringMatching(/well-formed Unicode/) },
    ]);
  });
});
