import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { Strategy } from 'passport-http-bearer';
import type { User } from '../../users/models/user.model.js';
import { AuthService } from '../auth.service.js';

/** An access token in the Authorization header: the person it opens, read afresh on every request. */
@Injectable()
export class BearerStrategy extends PassportStrategy(Strategy, 'bearer') {
  constructor(private readonly auth: AuthService) {
    super();
  }

  async validate(token: string): Promise<User | false> {
    return (await this.auth.personOf(token)) ?? false;
  }
}
