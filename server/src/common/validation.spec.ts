import { Body, Controller, Post } from '@nestjs/common';
import { ApiProperty, DocumentBuilder, SwaggerModule, type SchemaObject } from '@nestjs/swagger';
import { Test } from '@nestjs/testing';
import { plainToInstance } from 'class-transformer';
import { IsIn, IsOptional, validateSync } from 'class-validator';
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

/** Omittable above, below and without a description of its own; `kept` is the one field a body must carry. */
class Described {
  @Omittable()
  @IsRowId()
  bare?: number;

  @ApiProperty({ description: 'Described before it is made omittable' })
  @Omittable()
  @IsRowId()
  described?: number;

  @Omittable()
  @ApiProperty({ enum: ['a', 'b'] })
  @IsIn(['a', 'b'])
  chosen?: 'a' | 'b';

  @ApiProperty()
  @IsRowId()
  kept: number;
}

@Controller('described')
class DescribedController {
  @Post()
  take(@Body() _body: Described) {}
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

  // OpenAPI 3.0.3, Schema Object (after JSON Schema Validation, "required"): a property not listed in
  // `required` may be left out of the object.
  it('shows an omittable field as not required in the OpenAPI document, keeping what else describes it', async () => {
    const module = await Test.createTestingModule({ controllers: [DescribedController] }).compile();
    const app = module.createNestApplication();
    try {
      const document = SwaggerModule.createDocument(app, new DocumentBuilder().build());
      const schema = document.components?.schemas?.Described as SchemaObject;
      expect(Object.keys(schema.properties ?? {}).sort()).toEqual(['bare', 'chosen', 'described', 'kept']);
      expect(schema.required).toEqual(['kept']);
      expect(schema.properties?.described).toMatchObject({ description: 'Described before it is made omittable' });
      expect(schema.properties?.chosen).toMatchObject({ enum: ['a', 'b'] });
    } finally {
      await app.close();
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
