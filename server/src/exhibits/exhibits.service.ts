import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { ExhibitView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import { invalidField } from '../common/validation.js';
import { SettingsService } from '../venues/settings.service.js';
import type { CreateExhibitDto, UpdateExhibitDto } from './dto/exhibit.dto.js';
import { toExhibitView } from './exhibits.presenter.js';
import { Exhibit } from './models/exhibit.model.js';

@Injectable()
export class ExhibitsService extends SettingsService<Exhibit, ExhibitView> {
  constructor(@InjectModel(Exhibit) exhibits: typeof Exhibit) {
    super(exhibits, {
      label: 'exhibit',
      toView: toExhibitView,
      inUse: 'Stories still belong to this exhibit; move or delete them first.',
      parentKey: 'galleryId',
    });
  }

  override create(dto: CreateExhibitDto, person: Person) {
    assertPlannedDates(dto.plannedStart, dto.plannedEnd);
    return super.create(dto, person);
  }

  override async update(id: number, dto: UpdateExhibitDto, person: Person) {
    const exhibit = await this.find(id);
    assertPlannedDates(dto.plannedStart === undefined ? exhibit.plannedStart : dto.plannedStart, dto.plannedEnd === undefined ? exhibit.plannedEnd : dto.plannedEnd);
    return super.update(id, dto, person);
  }
}

// 'YYYY-MM-DD' strings order as their dates do.
function assertPlannedDates(start: string | null | undefined, end: string | null | undefined) {
  if (!start || !end || start <= end) return;
  throw invalidField(['plannedEnd'], 'The planned end comes after the planned start.');
}
