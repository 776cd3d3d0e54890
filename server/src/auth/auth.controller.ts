import { Body, Controller, Get, HttpCode, HttpStatus, Ip, Param, Patch, Post, Req, Res, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import type { SessionView } from '@mantlepiece/shared';
import { ConfigService } from '../config/config.service.js';
import { InvitationsService } from '../users/invitations.service.js';
import type { User } from '../users/models/user.model.js';
import { toUserView } from '../users/users.presenter.js';
import { UsersService } from '../users/users.service.js';
import { CurrentUser, Public } from './auth.decorators.js';
import { AuthService, type IssuedSession } from './auth.service.js';
import { AcceptInvitationDto } from './dto/accept-invitation.dto.js';
import { CompletePasswordResetDto } from './dto/complete-password-reset.dto.js';
import { RequestPasswordResetDto } from './dto/request-password-reset.dto.js';
import { SignInDto } from './dto/sign-in.dto.js';
import { UpdateProfileDto } from './dto/update-profile.dto.js';
import { LocalAuthGuard } from './local-auth.guard.js';
import { PasswordResetsService } from './password-resets.service.js';
import { ApiAnswer, ApiAnswerSent, ApiNoBody } from '../openapi/api-answer.decorator.js';

export const REFRESH_COOKIE = 'mp_refresh';
/** The cookie goes back only to the auth routes, never to the rest of the API. */
const REFRESH_COOKIE_PATH = '/api/auth';

/** The refresh token cookie, parsed by cookie-parser (whose `req.cookies` Express types as any). */
const refreshCookie = (req: Request): string | undefined => (req.cookies as Record<string, string | undefined> | undefined)?.[REFRESH_COOKIE];

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly invitations: InvitationsService,
    private readonly passwordResets: PasswordResetsService,
    private readonly config: ConfigService,
  ) {}

  /** The local strategy has checked the credentials (and the limits) by the time this runs. */
  @Public()
  @UseGuards(LocalAuthGuard)
  @ApiAnswer('SessionView')
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiBody({ type: SignInDto })
  async login(@CurrentUser() user: User, @Ip() ip: string, @Res({ passthrough: true }) res: Response): Promise<SessionView> {
    return this.withCookie(res, await this.auth.signIn(user, ip));
  }

  /**
   * No cookie at all is nobody signed in (the browser drops an expired one itself), an expected
   * state every signed-out page load asks about: 204, which no browser logs as an error. A cookie
   * the server does not accept is still 401.
   */
  @Public()
  @ApiAnswerSent('SessionView')
  @ApiNoBody(HttpStatus.NO_CONTENT, 'Nobody is signed in: the request carried no session cookie.')
  @Post('refresh')
  async refresh(@Req() req: Request, @Ip() ip: string, @Res() res: Response): Promise<void> {
    const token = refreshCookie(req);
    if (!token) {
      res.status(HttpStatus.NO_CONTENT).end();
      return;
    }
    res.status(HttpStatus.OK).json(this.withCookie(res, await this.auth.refresh(token, ip)));
  }

  /** Public, so a person whose access token has lapsed can still end the session. */
  @Public()
  @ApiNoBody()
  @Post('logout')
  @HttpCode(HttpStatus.NO_CONTENT)
  async logout(@Req() req: Request, @Res({ passthrough: true }) res: Response): Promise<void> {
    await this.auth.signOut(refreshCookie(req));
    res.clearCookie(REFRESH_COOKIE, this.cookieOptions());
  }

  @ApiBearerAuth()
  @ApiAnswer('UserView')
  @Get('me')
  me(@CurrentUser() user: User) {
    return toUserView(user);
  }

  @ApiBearerAuth()
  @ApiAnswer('UserView')
  @Patch('me')
  updateMe(@CurrentUser() user: User, @Body() dto: UpdateProfileDto) {
    return this.users.updateOwnProfile(user, dto);
  }

  @Public()
  @ApiAnswer('InvitationPreview')
  @Get('invitations/:token')
  invitation(@Param('token') token: string) {
    return this.invitations.describe(token);
  }

  @Public()
  @ApiAnswer('SessionView')
  @Post('invitations/accept')
  @HttpCode(HttpStatus.OK)
  async acceptInvitation(@Body() dto: AcceptInvitationDto, @Ip() ip: string, @Res({ passthrough: true }) res: Response): Promise<SessionView> {
    return this.withCookie(res, await this.auth.acceptInvitation(dto.token, dto.name, dto.password, ip));
  }

  @Public()
  @ApiNoBody(HttpStatus.ACCEPTED, 'Taken: a mail goes out when the address has an account.')
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  async requestPasswordReset(@Body() dto: RequestPasswordResetDto, @Ip() ip: string): Promise<void> {
    await this.passwordResets.requestReset(dto.email, ip);
  }

  @Public()
  @ApiNoBody()
  @Post('password-reset/complete')
  @HttpCode(HttpStatus.NO_CONTENT)
  async completePasswordReset(@Body() dto: CompletePasswordResetDto, @Ip() ip: string): Promise<void> {
    await this.passwordResets.completeReset(dto.token, dto.password, ip);
  }

  private withCookie(res: Response, { session, refresh }: IssuedSession): SessionView {
    res.cookie(REFRESH_COOKIE, refresh.token, { ...this.cookieOptions(), expires: refresh.expiresAt });
    return session;
  }

  private cookieOptions() {
    return { httpOnly: true, sameSite: 'strict' as const, secure: this.config.secureCookies, path: REFRESH_COOKIE_PATH };
  }
}
