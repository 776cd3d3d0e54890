import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { MyWorkService } from './my-work.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

/** The studio's home page: what is waiting for the signed-in person, for every role. */
@ApiTags('me')
@ApiBearerAuth()
@Controller('me')
export class MyWorkController {
  constructor(private readonly myWork: MyWorkService) {}

  @ApiAnswer('MyWorkView')
  @Get('work')
  work(@CurrentUser() user: User) {
    return this.myWork.workOf(user);
  }
}
