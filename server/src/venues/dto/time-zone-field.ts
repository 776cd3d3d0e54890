import { applyDecorators } from '@nestjs/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { registerDecorator } from 'class-validator';
import { canonicalTimeZone, DEFAULT_TIME_ZONE } from '@mantlepiece/shared';

function IsTimeZone() {
  return (target: object, propertyName: string | symbol) =>
    registerDecorator({
      name: 'isTimeZone',
      target: target.constructor,
      propertyName: String(propertyName),
      options: { message: 'Use an IANA time zone name such as Europe/London or Pacific/Auckland.' },
      validator: { validate: (value: unknown) => typeof value === 'string' && canonicalTimeZone(value) !== null },
    });
}

/** An IANA time zone name the platform's Intl knows, stored as Intl spells it. */
export const TimeZoneField = () =>
  applyDecorators(
    ApiProperty({
      example: 'Pacific/Auckland', default: DEFAULT_TIME_ZONE, maxLength: 64,
      description: "IANA time zone whose calendar days the venue's dates follow: Insights days, licence expiry, preflight's today, mail and CSV exports",
    }),
    Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? (canonicalTimeZone(value.trim()) ?? value) : value)),
    IsTimeZone(),
  );
