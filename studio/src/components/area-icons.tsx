import type { FluentIcon } from '@fluentui/react-icons';
import {
  ClipboardTaskListLtrRegular,
  DataBarVerticalRegular,
  DesktopRegular,
  DocumentTextRegular,
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
  fleet: DesktopRegular,
  insights: DataBarVerticalRegular,
  people: PeopleRegular,
  settings: SettingsRegular,
};

