import type { KioskMessages } from './en';

export const fr: KioskMessages = {
  attract: {
    touch: 'Touchez pour commencer',
  },
  notPaired: {
    title: 'Les récits arrivent bientôt',
  },
  pairing: {
    codeLabel: 'Code d’association',
    steps: 'Pour le personnel : dans le studio, ouvrez Postes, puis le poste de cet écran, et saisissez-y ce code.',
    renew: 'Quand le code expire, un nouveau code s’affiche ici tout seul.',
    unreachable: 'Impossible de joindre le serveur pour obtenir un code d’association. Nouvel essai en cours.',
    unpaired: 'Cet écran a été dissocié dans le studio. Pour le réutiliser, associez-le avec le code ci-dessous.',
  },
  waiting: {
    body: 'Cet écran est associé et attend sa première version publiée depuis le studio.',
    refused: 'La version {{release}} a été refusée : un fichier ne correspond pas à la liste signée de la version. Nouvel essai après {{time}}, ou dès qu’une nouvelle version est publiée.',
  },
  menu: {
    title: 'Choisissez un récit',
    panels_one: '{{count}} écran',
    panels_other: '{{count}} écrans',
  },
  story: {
    previous: 'Précédent',
    next: 'Suivant',
    allStories: 'Tous les récits',
    position: '{{current}} sur {{total}}',
  },
  settings: {
    language: 'Langue',
    largeText: 'Texte plus grand',
    highContrast: 'Contraste élevé',
    reducedMotion: 'Moins de mouvement',
  },
  idle: {
    title: 'Vous êtes toujours là ?',
    body_one: 'Cet écran revient au début dans {{count}} seconde.',
    body_other: 'Cet écran revient au début dans {{count}} secondes.',
    stay: 'Je suis toujours là',
  },
};
