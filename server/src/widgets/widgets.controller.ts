import { Body, Controller, Get, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Roles } from '../auth/auth.decorators.js';
import { ValidateWidgetDto } from './dto/validate-widget.dto.js';
import { WidgetsService } from './widgets.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('widgets')
@ApiBearerAuth()
@Roles(...ROLES)
@Controller('widgets')
export class WidgetsController {
  constructor(private readonly widgets: WidgetsService) {}

  /** Widget types with the JSON Schema of their params and their defaults, for the studio's forms. */
  @ApiAnswer('WidgetTypeList')
  @Get()
  list() {
    return this.widgets.listTypes();
  }

  /** 200 with the computed result, or 422 with an error per field. */
  @ApiAnswer('WidgetCheckView')
  @Post('validate')
  @HttpCode(HttpStatus.OK)
  validate(@Body() body: ValidateWidgetDto) {
    return this.widgets.check(body.type, body.params);
  }
}
