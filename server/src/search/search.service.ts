import { Injectable } from '@nestjs/common';
import type { Page, SearchHit, SearchKind, SearchView } from '@mantlepiece/shared';
import { rolesAnywhere, type Member } from '../auth/policy.js';
import { ListMediaQuery } from '../media/dto/media.dto.js';
import { MediaService } from '../media/media.service.js';
import { ListStoriesQuery } from '../stories/dto/story.dto.js';
import { StoriesService } from '../stories/stories.service.js';
import { ListUsersQuery } from '../users/dto/list-users.query.js';
import { UsersService } from '../users/users.service.js';
import type { SearchQuery } from './dto/search.query.js';

/**
 * One search across stories, media and people, each kind through its own list and so through its
 * own venue boundary and rules: stories and images of the caller's venues, people only for an
 * admin (of their venues' members, for a venue admin). A kind the caller may not list is left out.
 */
@Injectable()
export class SearchService {
  constructor(
    private readonly stories: StoriesService,
    private readonly media: MediaService,
    private readonly users: UsersService,
  ) {}

  async search(query: SearchQuery, member: Member): Promise<SearchView> {
    const wanted = (kind: SearchKind) => query.kind === undefined || query.kind === kind;
    const window = { q: query.q, page: query.page, pageSize: query.pageSize };
    const view: SearchView = {};
    if (wanted('stories')) {
      const page = await this.stories.list(Object.assign(new ListStoriesQuery(), window), member);
      view.stories = hits(page, (story) => ({ id: story.id, label: story.title, detail: story.exhibitName }));
    }
    if (wanted('media')) {
      const page = await this.media.list(Object.assign(new ListMediaQuery(), window), member);
      view.media = hits(page, (asset) => ({ id: asset.id, label: asset.filename, detail: asset.credit }));
    }
    if (wanted('people') && rolesAnywhere(member).includes('admin')) {
      const page = await this.users.list(member, Object.assign(new ListUsersQuery(), window));
      view.people = hits(page, (person) => ({ id: person.id, label: person.name, detail: person.email }));
    }
    return view;
  }
}

function hits<T>(page: Page<T>, toHit: (item: T) => SearchHit): Page<SearchHit> {
  return { items: page.items.map(toHit), total: page.total, page: page.page, pageSize: page.pageSize };
}
