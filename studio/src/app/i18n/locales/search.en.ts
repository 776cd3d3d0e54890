/** The header's global search (components/GlobalSearch.tsx). */
export const searchEn = {
  search: {
    label: 'Search stories, media and people',
    placeholder: 'Search',
    tooShort: 'Type {{min}} characters or more.',
    failed: 'The search could not be done. Try again.',
    nothing: 'Nothing found for “{{q}}”.',
    all: 'All results in {{kind}}',
    kinds: { stories: 'Stories', media: 'Media', people: 'People' },
  },
};
