import { Body, Controller, Delete, Get, HttpCode, HttpStatus, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { Roles } from '../auth/auth.decorators.js';
import { CreateExhibitDto, ListExhibitsQuery, UpdateExhibitDto } from './dto/exhibit.dto.js';
import { ExhibitsService } from './exhibits.service.js';

@ApiTags('exhibits')
@ApiBearerAuth()
@Roles('admin')
@Controller('exhibits')
export class ExhibitsController {
  constructor(private readonly exhibits: ExhibitsService) {}

  @Roles(...ROLES)
  @Get()
  list(@Query() query: ListExhibitsQuery) {
    return this.exhibits.list(query);
  }

  @Roles(...ROLES)
  @Get(':id')
  get(@Param('id', ParseIntPipe) id: number) {
    return this.exhibits.get(id);
  }

  @Post()
  create(@Body() dto: CreateExhibitDto) {
    return this.exhibits.create(dto);
  }

  @Patch(':id')
  update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateExhibitDto) {
    return this.exhibits.update(id, dto);
  }

  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  delete(@Param('id', ParseIntPipe) id: number) {
    return this.exhibits.delete(id);
  }
}
