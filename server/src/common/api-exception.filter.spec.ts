import { BadRequestException, NotFoundException } from '@nestjs/common';
import { describe, expect, it } from 'vitest';
import { toErrorBody } from './api-exception.filter.js';

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
});
