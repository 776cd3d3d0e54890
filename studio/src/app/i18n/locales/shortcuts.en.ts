/** The keyboard-shortcut sheet (components/KeyboardShortcuts.tsx). */
export const shortcutsEn = {
  shortcuts: {
    open: 'Keyboard shortcuts',
    title: 'Keyboard shortcuts',
    groups: { anywhere: 'Anywhere', text: 'Panel text', panels: 'Panel list', drawings: 'A widget’s drawing', translation: 'Translation workspace' },
    does: {
      sheet: 'Show this list',
      bold: 'Bold',
      italic: 'Italic',
      undo: 'Undo',
      redo: 'Redo',
      panelEdges: 'Go to the panel’s start or end, before a widget that starts it',
      movePanel: 'Move the chosen panel earlier or later',
      change: 'Change the value the drawing sets (tilt, age, length)',
      fineChange: 'Change it in small steps',
      bigChange: 'Change it in large steps',
      ends: 'Go to the smallest or largest value',
      saveNext: 'Save the translation and go to the next unit',
      otherUnit: 'Go to the previous or next unit',
    },
  },
};
