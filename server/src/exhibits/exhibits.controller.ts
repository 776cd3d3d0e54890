import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { CreateExhibitDto, ListExhibitsQuery, UpdateExhibitDto } from './dto/exhibit.dto.js';
import { ExhibitsService } from './exhibits.service.js';
import { ApiAnswer, ApiNoBody } from '../openapi/api-answer.decorator.js';

@ApiTags('exhibits')
@ApiBearerAuth()
@Roles('admin')
@Controller('exhibits')
export class ExhibitsController {
  constructor(private readonly exhibits: ExhibitsService) {}

  @Roles(...ROLES)
  @ApiAnswer('ExhibitPage')
  @Get()
  list(@Query() query: ListExhibitsQuery, @CurrentUser() person: User) {
    return this.exhibits.list(query, person);
  }

  @Roles(...ROLES)
  @ApiAnswer('ExhibitView')
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.exhibits.get(id, person);
  }

  @ApiAnswer('ExhibitView', { status: HttpStatus.CREATED })
  @Post()
  create(@Body() dto: CreateExhibitDto, @CurrentUser() person: User) {
    return this.exhibits.create(dto, person);
  }

  @ApiAnswer('ExhibitView')
  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateExhibitDto, @CurrentUser() person: User) {
    return this.exhibits.update(id, dto, person);
  }

  @ApiNoBody()
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number, @CurrentUser() person: User) {
    return this.exhibits.delete(id, person);
  }
}
