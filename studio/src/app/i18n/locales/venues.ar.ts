import type { venuesEn } from './venues.en';

export const venuesAr: typeof venuesEn = {
  venueSwitcher: {
    current: 'المكان: {{venue}}',
    menu: 'الأماكن',
  },
  memberships: {
    venue: 'المكان',
    everyVenue: 'كل الأماكن',
    everyVenueHint: 'أدوار في كل الأماكن، ومنها ما يُضاف لاحقًا. لا يمنحها إلا مسؤول المؤسسة.',
    venueHint: 'أدوار في هذا المكان فقط.',
  },
};
