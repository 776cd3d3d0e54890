import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { registerDecorator, type ValidationOptions } from 'class-validator';
import { canonicalLanguageTag } from '@mantlepiece/shared';

/** The canonical form of a BCP 47 tag (`pt-br` → `pt-BR`), or null when it is not one: the apps' own rule. */
export const canonicalLocale = canonicalLanguageTag;

function IsLocaleTag(options: ValidationOptions = {}) {
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isLocaleTag',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: 'Use a BCP 47 language tag such as en, fr or pt-BR.', ...options },
      validator: { validate: (value: unknown) => canonicalLocale(value) !== null },
    });
}

const canonical = (value: unknown) => canonicalLocale(value) ?? value;

/** A BCP 47 tag, checked by the platform's own parser and stored in canonical form. */
export const LocaleTagField = () =>
  applyDecorators(Transform(({ value }) => canonical(value)), IsLocaleTag());

/** A list of BCP 47 tags, each checked and stored in canonical form. */
export const LocaleTagsField = () =>
  applyDecorators(
    Transform(({ value }: { value: unknown }) => (Array.isArray(value) ? value.map(canonical) : value)),
    IsLocaleTag({ each: true, message: 'Each locale must be a BCP 47 language tag such as fr or pt-BR.' }),
  );
