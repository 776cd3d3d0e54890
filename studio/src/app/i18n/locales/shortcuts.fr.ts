import type { shortcutsEn } from './shortcuts.en';

export const shortcutsFr: typeof shortcutsEn = {
  shortcuts: {
    open: 'Raccourcis clavier',
    title: 'Raccourcis clavier',
    groups: { anywhere: 'Partout', text: 'Texte du panneau', panels: 'Liste des panneaux', drawings: 'Le dessin d’un widget', translation: 'Espace de traduction' },
    does: {
      sheet: 'Afficher cette liste',
      bold: 'Gras',
      italic: 'Italique',
      undo: 'Annuler',
      redo: 'Rétablir',
      panelEdges: 'Aller au début ou à la fin du panneau, avant un widget qui l’ouvre',
      movePanel: 'Avancer ou reculer le panneau choisi',
      change: 'Changer la valeur que règle le dessin (pente, âge, longueur)',
      fineChange: 'La changer par petits pas',
      bigChange: 'La changer par grands pas',
      ends: 'Aller à la plus petite ou à la plus grande valeur',
      saveNext: 'Enregistrer la traduction et passer à l’unité suivante',
      otherUnit: 'Aller à l’unité précédente ou suivante',
    },
  },
};
