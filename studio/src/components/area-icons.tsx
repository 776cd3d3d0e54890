import type { FluentIcon } from '@fluentui/react-icons';
import {
  ClipboardTaskListLtrRegular,
  DataBarVerticalRegular,
  DocumentTextRegular,
  HeartPulseRegular,
  ImageRegular,
  PeopleRegular,
  RocketRegular,
  SettingsRegular,
  TranslateRegular,
} from '@fluentui/react-icons';
import type { Area } from '../app/areas';

export const AREA_ICONS: Record<Area, FluentIcon> = {
  stories: DocumentTextRegular,
  media: ImageRegular,
  reviews: ClipboardTaskListLtrRegular,
  translations: TranslateRegular,
  releases: RocketRegular,
  // Heartbeats are what Fleet watches; a screen icon would look like Stations' own.
  fleet: HeartPulseRegular,
  insights: DataBarVerticalRegular,
  people: PeopleRegular,
  settings: SettingsRegular,
};
