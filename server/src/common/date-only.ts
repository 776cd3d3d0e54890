import { applyDecorators } from '@nestjs/common';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, registerDecorator } from 'class-validator';

/** A calendar date 'YYYY-MM-DD' that exists (no 2026-02-30). */
export function isDateOnly(value: unknown): value is string {
  if (typeof value !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

function IsDateOnly() {
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isDateOnly',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: 'Use a date written YYYY-MM-DD.' },
      validator: { validate: isDateOnly },
    });
}

/** An optional date that may also be cleared with null. */
export const OptionalDateOnlyField = (description: string) =>
  applyDecorators(ApiPropertyOptional({ example: '2027-06-30', type: 'string', format: 'date', nullable: true, description }), IsOptional(), IsDateOnly());

/** Today's date in UTC, as DATE columns hold it. */
export const dateOnlyOf = (moment: Date): string => moment.toISOString().slice(0, 10);
