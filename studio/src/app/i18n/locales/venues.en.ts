/** The venue switcher's and the People page's venue words (app/current-venue.tsx, routes/people). */
export const venuesEn = {
  venueSwitcher: {
    current: 'Venue: {{venue}}',
    menu: 'Venues',
  },
  memberships: {
    venue: 'Venue',
    everyVenue: 'Every venue',
    everyVenueHint: 'Roles at every venue, including venues added later. Only an organisation admin gives them.',
    venueHint: 'Roles at this venue only.',
  },
};
