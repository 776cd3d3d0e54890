import type { ExhibitView } from '@mantlepiece/shared';
import type { Exhibit } from './models/exhibit.model.js';

export const toExhibitView = (exhibit: Exhibit): ExhibitView => ({
  id: exhibit.id,
  galleryId: exhibit.galleryId,
  name: exhibit.name,
  plannedStart: exhibit.plannedStart ?? null,
  plannedEnd: exhibit.plannedEnd ?? null,
});
