/** Undo after deleting a panel or an image (components/UndoToaster.tsx). */
export const undoEn = {
  undo: {
    panelDeleted: 'Panel {{number}} deleted.',
    imageDeleted: '“{{name}}” deleted.',
    action: 'Undo',
    restored: 'Restored.',
    failed: 'It could not be restored: {{problem}}',
  },
};
