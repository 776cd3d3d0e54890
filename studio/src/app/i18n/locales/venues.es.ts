import type { venuesEn } from './venues.en';

export const venuesEs: typeof venuesEn = {
  venueSwitcher: {
    current: 'Sede: {{venue}}',
    menu: 'Sedes',
  },
  memberships: {
    venue: 'Sede',
    everyVenue: 'Todas las sedes',
    everyVenueHint: 'Roles en todas las sedes, también en las que se añadan más adelante. Solo un administrador de la organización los asigna.',
    venueHint: 'Roles solo en esta sede.',
  },
};
