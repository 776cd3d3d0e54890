import { Injectable, type ExecutionContext } from '@nestjs/common';
import { AuthGuard } from '@nestjs/passport';
import type { Request } from 'express';
import { createValidationPipe } from '../common/validation.js';
import { SignInDto } from './dto/sign-in.dto.js';

/**
 * Runs the local strategy on the sign-in route. Guards run before pipes, so the body is checked
 * against SignInDto here first: a missing field is a 400 naming it, as on every other route.
 */
@Injectable()
export class LocalAuthGuard extends AuthGuard('local') {
  private readonly validation = createValidationPipe();

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<Request>();
    request.body = (await this.validation.transform(request.body ?? {}, { type: 'body', metatype: SignInDto })) as SignInDto;
    return (await super.canActivate(context)) as boolean;
  }
}
