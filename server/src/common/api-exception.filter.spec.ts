import { BadRequestException, NotFoundException } from '@nestjs/common';
import { ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { toErrorBody } from './api-exception.filter.js';

/** As the MySQL dialect builds it: the columns as a list, which the typings do not foresee. */
const foreignKeyError = (reltype: 'parent' | 'child', columns: string[]) =>
  new ForeignKeyConstraintError({ reltype, fields: columns, table: 'releases' } as unknown as ConstructorParameters<typeof ForeignKeyConstraintError>[0]);

describe('toErrorBody', () => {
  it('never passes on what a crash says about the server', () => {
    const body = toErrorBody(new Error('connect ECONNREFUSED 10.0.0.7:3306 at /srv/app/dist/db.js:12'));
    expect(body).toEqual({ statusCode: 500, message: 'Something went wrong on the server.' });
  });

  it('keeps the message and field errors of an HTTP error', () => {
    expect(toErrorBody(new NotFoundException('There is no such person.'))).toEqual({ statusCode: 404, message: 'There is no such person.' });
    const errors = [{ path: ['roles', 0], message: 'Each role must be one of admin, curator.' }];
    expect(toErrorBody(new BadRequestException({ message: 'Some fields are not valid.', errors }))).toEqual({
      statusCode: 400, message: 'Some fields are not valid.', errors,
    });
  });

  it('answers a write naming a row that does not exist with 422, naming the field, not the column', () => {
    expect(toErrorBody(foreignKeyError('child', ['last_release_id']))).toEqual({
      statusCode: 422, message: 'Some fields name records that do not exist.', errors: [{ path: ['lastReleaseId'], message: 'There is no such record.' }],
    });
  });

  it('answers a delete of a row others point at, and a duplicate, with 409 and nothing of the database', () => {
    expect(toErrorBody(foreignKeyError('parent', ['gallery_id']))).toEqual({ statusCode: 409, message: 'Other records still refer to this one.' });
    expect(toErrorBody(new UniqueConstraintError({ fields: { slug: 'basalt-point' } }))).toEqual({ statusCode: 409, message: 'Another record already uses this value.' });
  });
});
