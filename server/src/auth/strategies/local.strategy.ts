import { Injectable } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import type { Request } from 'express';
import { Strategy } from 'passport-local';
import type { User } from '../../users/models/user.model.js';
import { AuthService } from '../auth.service.js';

/** E-mail and password from the sign-in body; the rules (limits, the one 401 message) are AuthService's. */
@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy, 'local') {
  constructor(private readonly auth: AuthService) {
    super({ usernameField: 'email', passwordField: 'password', passReqToCallback: true });
  }

  validate(request: Request, email: string, password: string): Promise<User> {
    return this.auth.checkCredentials(email, password, request.ip ?? '');
  }
}
