import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ForOrganisation, Roles } from '../auth/auth.decorators.js';
import { PageQuery } from '../common/page.js';
import { DevMailService } from './dev-mail.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('dev')
@ApiBearerAuth()
@Roles('admin')
@ForOrganisation()
@Controller('dev/mail')
export class DevMailController {
  constructor(private readonly devMail: DevMailService) {}

  @ApiAnswer('CapturedMailPage')
  @Get()
  list(@Query() query: PageQuery) {
    return this.devMail.list(query);
  }

  @ApiAnswer('CapturedMail')
  @Get(':id')
  get(@Param('id') id: string) {
    return this.devMail.get(id);
  }
}
