import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { ExhibitView } from '@mantlepiece/shared';
import type { Member } from '../auth/policy.js';
import { invalidField } from '../common/validation.js';
import { Gallery } from '../venues/models/gallery.model.js';
import { galleryVenue, SettingsService } from '../venues/settings.service.js';
import { SETTINGS_KEEPERS } from '../venues/station-policy.js';
import type { CreateExhibitDto, UpdateExhibitDto } from './dto/exhibit.dto.js';
import { toExhibitView } from './exhibits.presenter.js';
import { Exhibit } from './models/exhibit.model.js';

@Injectable()
export class ExhibitsService extends SettingsService<Exhibit, ExhibitView> {
  constructor(@InjectModel(Exhibit) exhibits: typeof Exhibit, @InjectModel(Gallery) galleries: typeof Gallery) {
    super(exhibits, {
      label: 'exhibit',
      toView: toExhibitView,
      inUse: 'Stories still belong to this exhibit; move or delete them first.',
      parentKey: 'galleryId',
      venue: galleryVenue(galleries),
      keepers: SETTINGS_KEEPERS,
    });
  }

  override create(dto: CreateExhibitDto, member: Member) {
    assertPlannedDates(dto.plannedStart, dto.plannedEnd);
    return super.create(dto, member);
  }

  override async update(id: number, dto: UpdateExhibitDto, member: Member) {
    const exhibit = await this.kept(id, member);
    assertPlannedDates(dto.plannedStart === undefined ? exhibit.plannedStart : dto.plannedStart, dto.plannedEnd === undefined ? exhibit.plannedEnd : dto.plannedEnd);
    return super.update(id, dto, member);
  }
}

// 'YYYY-MM-DD' strings order as their dates do.
function assertPlannedDates(start: string | null | undefined, end: string | null | undefined) {
  if (!start || !end || start <= end) return;
  throw invalidField(['plannedEnd'], 'The planned end comes after the planned start.');
}
