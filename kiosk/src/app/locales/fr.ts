import type { KioskMessages } from './en';

export const fr: KioskMessages = {
  attract: {
    touch: 'Touchez pour commencer',
  },
  notPaired: {
    title: 'Les récits arrivent bientôt',
    body: 'Cet écran n’est pas encore associé à un poste ; il n’a donc pas encore de récit à montrer.',
    staff: 'Pour le personnel : associez cette borne à un poste depuis le studio.',
    back: 'Retour',
  },
  offline: {
    title: 'Cet écran ne joint pas son serveur',
    body: 'Il réessaie tout seul toutes les trente secondes.',
  },
};
