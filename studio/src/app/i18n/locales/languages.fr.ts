import type { languagesEn } from './languages.en';

export const languagesFr: typeof languagesEn = {
  languagePicker: {
    chosen: 'Langues choisies',
    placeholder: 'Chercher par nom de langue ou par code',
    noMatch: 'Aucune langue ne correspond à « {{query}} ».',
    remove: 'Retirer : {{language}}',
  },
};
