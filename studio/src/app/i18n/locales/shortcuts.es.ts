import type { shortcutsEn } from './shortcuts.en';

export const shortcutsEs: typeof shortcutsEn = {
  shortcuts: {
    open: 'Atajos de teclado',
    title: 'Atajos de teclado',
    groups: { anywhere: 'En cualquier sitio', text: 'Texto del panel', panels: 'Lista de paneles', drawings: 'El dibujo de un widget', translation: 'Espacio de traducción' },
    does: {
      sheet: 'Mostrar esta lista',
      bold: 'Negrita',
      italic: 'Cursiva',
      undo: 'Deshacer',
      redo: 'Rehacer',
      panelEdges: 'Ir al principio o al final del panel, antes de un widget que lo abre',
      movePanel: 'Mover el panel elegido antes o después',
      change: 'Cambiar el valor que fija el dibujo (inclinación, edad, longitud)',
      fineChange: 'Cambiarlo en pasos pequeños',
      bigChange: 'Cambiarlo en pasos grandes',
      ends: 'Ir al valor más pequeño o más grande',
      saveNext: 'Guardar la traducción y pasar a la unidad siguiente',
      otherUnit: 'Ir a la unidad anterior o siguiente',
    },
  },
};
