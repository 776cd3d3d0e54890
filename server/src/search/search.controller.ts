import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ROLES } from '@mantlepiece/shared';
import { CurrentUser, Roles } from '../auth/auth.decorators.js';
import type { User } from '../users/models/user.model.js';
import { SearchQuery } from './dto/search.query.js';
import { SearchService } from './search.service.js';
import { ApiAnswer } from '../openapi/api-answer.decorator.js';

@ApiTags('search')
@ApiBearerAuth()
@Controller('search')
export class SearchController {
  constructor(private readonly searchService: SearchService) {}

  @Roles(...ROLES)
  @ApiAnswer('SearchView')
  @Get()
  search(@Query() query: SearchQuery, @CurrentUser() person: User) {
    return this.searchService.search(query, person);
  }
}
