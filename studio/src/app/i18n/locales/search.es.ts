import type { searchEn } from './search.en';

export const searchEs: typeof searchEn = {
  search: {
    label: 'Buscar historias, medios y personas',
    placeholder: 'Buscar',
    tooShort: 'Escriba al menos {{min}} caracteres.',
    failed: 'No se pudo hacer la búsqueda. Inténtelo de nuevo.',
    nothing: 'No se encontró nada para «{{q}}».',
    all: 'Todos los resultados en {{kind}}',
    kinds: { stories: 'Historias', media: 'Medios', people: 'Personas' },
  },
};
