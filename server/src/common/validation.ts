import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { ApiErrorBody } from '@mantlepiece/shared';

type FieldError = NonNullable<ApiErrorBody['errors']>[number];

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

export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    exceptionFactory: (errors) => invalidFields(fieldErrors(errors)),
  });
}
