import type { searchEn } from './search.en';

export const searchFr: typeof searchEn = {
  search: {
    label: 'Rechercher des histoires, des médias et des personnes',
    placeholder: 'Rechercher',
    tooShort: 'Tapez au moins {{min}} caractères.',
    failed: 'La recherche n’a pas abouti. Réessayez.',
    nothing: 'Aucun résultat pour « {{q}} ».',
    all: 'Tous les résultats dans {{kind}}',
    kinds: { stories: 'Histoires', media: 'Médias', people: 'Personnes' },
  },
};
