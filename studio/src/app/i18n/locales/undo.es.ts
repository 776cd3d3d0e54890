import type { undoEn } from './undo.en';

export const undoEs: typeof undoEn = {
  undo: {
    panelDeleted: 'Panel {{number}} eliminado.',
    imageDeleted: '«{{name}}» eliminada.',
    action: 'Deshacer',
    restored: 'Restaurado.',
    failed: 'No se pudo restaurar: {{problem}}',
  },
};
