import type { undoEn } from './undo.en';

export const undoFr: typeof undoEn = {
  undo: {
    panelDeleted: 'Panneau {{number}} supprimé.',
    imageDeleted: '« {{name}} » supprimée.',
    action: 'Annuler',
    restored: 'Rétabli.',
    failed: 'Impossible de le rétablir : {{problem}}',
  },
};
