import type { undoEn } from './undo.en';

export const undoAr: typeof undoEn = {
  undo: {
    panelDeleted: 'حُذفت اللوحة {{number}}.',
    imageDeleted: 'حُذفت «{{name}}».',
    action: 'تراجع',
    restored: 'تمت الاستعادة.',
    failed: 'تعذّرت الاستعادة: {{problem}}',
  },
};
