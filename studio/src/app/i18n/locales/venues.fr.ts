import type { venuesEn } from './venues.en';

export const venuesFr: typeof venuesEn = {
  venueSwitcher: {
    current: 'Lieu : {{venue}}',
    menu: 'Lieux',
  },
  memberships: {
    venue: 'Lieu',
    everyVenue: 'Tous les lieux',
    everyVenueHint: 'Rôles dans tous les lieux, y compris ceux ajoutés plus tard. Seul un administrateur de l’organisation les attribue.',
    venueHint: 'Rôles dans ce lieu seulement.',
  },
};
