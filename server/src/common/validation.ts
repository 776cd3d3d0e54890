import {
  applyDecorators, BadRequestException, UnprocessableEntityException, ValidationPipe,
  type ArgumentMetadata, type Type as ClassType, type ValidationError,
} from '@nestjs/common';
import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsArray, IsInt, IsObject, Max, Min, ValidateIf, ValidateNested, type ValidationOptions } from 'class-validator';
import type { ApiErrorBody } from '@mantlepiece/shared';

type FieldError = NonNullable<ApiErrorBody['errors']>[number];

/**
 * The largest values the API takes for the integer columns. Ids sit in INT UNSIGNED columns but
 * are handed out from 1 and stay inside the signed 32-bit range every client reads them in; an id
 * beyond it cannot name a row. BIGINT UNSIGNED counts are bounded by what a JSON number holds
 * exactly.
 */
export const ID_MAX = 2_147_483_647;
export const UNSIGNED_INT_MAX = 4_294_967_295;
export const UNSIGNED_BIGINT_MAX = Number.MAX_SAFE_INTEGER;

/** A whole number from `min` to `max`: the one rule for every integer a request carries. */
export const IsIntBetween = (min: number, max: number, options: ValidationOptions = {}) =>
  applyDecorators(IsInt(options), Min(min, options), Max(max, options));

/** The id of a row, in a body or a query. */
export const IsRowId = (options: ValidationOptions = {}) => IsIntBetween(1, ID_MAX, options);

/** Digits only: Number() would also read `1e3`, `0x10` and blanks as numbers. */
const DECIMAL_INTEGER = /^-?\d{1,20}$/;

/** An integer of a query string: converted from its decimal text, then bounded like any other. */
export const QueryInt = (min: number, max: number, options: ValidationOptions = {}) =>
  applyDecorators(
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' && DECIMAL_INTEGER.test(value) ? Number(value) : value)),
    IsIntBetween(min, max, options),
  );

/** The id of a row in a query string, such as `?galleryId=`. */
export const QueryRowId = (options: ValidationOptions = {}) => QueryInt(1, ID_MAX, options);

/**
 * The field may be left out; unlike @IsOptional, null is not taken for "left out" but checked by
 * the field's rules, which refuse it. @IsOptional stays for fields where null clears a value.
 * The OpenAPI document shows the field as not required whatever else describes it (only `required`
 * is merged into the field's other @ApiProperty options), so the document and the check agree.
 */
export const Omittable = () =>
  applyDecorators(ApiPropertyOptional(), ValidateIf((_object, value) => value !== undefined));

/** A PATCH body: every field of `dto` may be left out, and null goes only where `dto` takes it. */
export const PatchType = <T>(dto: ClassType<T>) => PartialType(dto, { skipNullProperties: false });

/** A nested object checked by its own class; an array or a primitive in its place is refused. */
export const NestedObject = (dto: () => ClassType<unknown>) => applyDecorators(IsObject(), ValidateNested(), Type(dto));

/** A list of nested objects, each checked by its class; an array or a primitive as an item is refused. */
export const NestedObjects = (dto: () => ClassType<unknown>) =>
  applyDecorators(IsArray(), IsObject({ each: true, message: 'Each item must be an object.' }), ValidateNested({ each: true }), Type(dto));

/** Turns class-validator's tree of failures into one entry per problem, each with its field path. */
export function fieldErrors(errors: ValidationError[], parent: (string | number)[] = []): FieldError[] {
  return errors.flatMap((error) => {
    const path = [...parent, /^\d+$/.test(error.property) ? Number(error.property) : error.property];
    const own = Object.values(error.constraints ?? {}).map((message) => ({ path, message }));
    return [...own, ...fieldErrors(error.children ?? [], path)];
  });
}

/** The 400 for fields a request got wrong, each problem under its field's path. */
export function invalidFields(errors: FieldError[]): BadRequestException {
  return new BadRequestException({ statusCode: 400, message: 'Some fields are not valid.', errors });
}

/** The 400 for one field a rule in a service refuses, shaped like the validation pipe's. */
export function invalidField(path: FieldError['path'], message: string): BadRequestException {
  return invalidFields([{ path, message }]);
}

export const UNKNOWN_REFERENCE_MESSAGE = 'Some fields name records that do not exist.';

/** The 422 for fields that are well formed but name rows that do not exist. */
export function unknownReferences(errors: FieldError[]): UnprocessableEntityException {
  return new UnprocessableEntityException({ statusCode: 422, message: UNKNOWN_REFERENCE_MESSAGE, errors });
}

export const unknownReference = (path: FieldError['path'], message: string) => unknownReferences([{ path, message }]);

const MALFORMED_TEXT = 'Text must be well-formed Unicode: a lone UTF-16 surrogate cannot be stored.';
// With the u flag a surrogate pair reads as one code point, so only a lone surrogate matches.
const LONE_SURROGATE = /\p{Cs}/u;
const LONE_SURROGATES = /\p{Cs}/gu;
const MAX_TEXT_ERRORS = 20;

/**
 * Every string and object key of a request that is not well-formed UTF-16 (a lone surrogate, which
 * JSON's \u escapes can carry but UTF-8 and the database cannot), with its path. Bodies arrive
 * already bounded in depth by the JSON parser.
 */
export function malformedText(value: unknown, path: (string | number)[] = [], found: FieldError[] = []): FieldError[] {
  if (found.length >= MAX_TEXT_ERRORS) return found;
  if (typeof value === 'string') {
    if (LONE_SURROGATE.test(value)) found.push({ path, message: MALFORMED_TEXT });
  } else if (Array.isArray(value)) {
    value.forEach((item, index) => malformedText(item, [...path, index], found));
  } else if (typeof value === 'object' && value !== null && !Buffer.isBuffer(value)) {
    for (const [key, item] of Object.entries(value)) {
      if (LONE_SURROGATE.test(key)) found.push({ path: [...path, key.replace(LONE_SURROGATES, '\uFFFD')], message: MALFORMED_TEXT });
      else malformedText(item, [...path, key], found);
    }
  }
  return found;
}

/** The validation pipe, after a check every body, query and path parameter gets whatever its type. */
class ApiValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type !== 'custom') {
      const problems = malformedText(value, metadata.data ? [metadata.data] : []);
      if (problems.length > 0) throw invalidFields(problems);
    }
    return super.transform(value, metadata);
  }
}

export function createValidationPipe(): ValidationPipe {
  return new ApiValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => invalidFields(fieldErrors(errors)),
  });
}
