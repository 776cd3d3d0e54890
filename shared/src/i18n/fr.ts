import type { WidgetStrings } from './types.js';

export const fr: WidgetStrings = {
  caution:
    'Modèle pédagogique simplifié. Un conservateur a choisi ces réglages pour montrer une idée ; la roche réelle se comporte de façon plus compliquée.',
  slopeForce: {
    title: 'Bloc sur une pente',
    instructions: 'Faites glisser la pente vers le haut ou vers le bas, ou utilisez les flèches du clavier, pour changer son inclinaison.',
    angleLabel: 'Angle de la pente',
    criticalAngle: 'Commence à glisser à {{angle}}',
    weight: 'Poids',
    normal: 'Appuie sur la pente',
    shear: 'Tire vers le bas de la pente',
    friction: 'Frottement',
    holds: 'Tient',
    slides: 'Glisse',
    holdsDetail: 'Le frottement suffit à retenir le bloc.',
    slidesDetail: 'La traction vers le bas dépasse ce que le frottement peut retenir.',
    step: 'Avancer d’un pas',
    reset: 'Remettre le bloc en place',
    describeHolds:
      'Un bloc de {{mass}} repose sur une pente inclinée de {{angle}}. Son poids de {{weight}} appuie sur la pente avec {{normal}} et le tire vers le bas de la pente avec {{shear}}. Le frottement peut retenir jusqu’à {{maxFriction}} : le bloc tient. Il commencerait à glisser au-delà de {{critical}}.',
    describeSlides:
      'Un bloc de {{mass}} repose sur une pente inclinée de {{angle}}. Son poids de {{weight}} appuie sur la pente avec {{normal}} et le tire vers le bas de la pente avec {{shear}}. Le frottement ne peut retenir que {{maxFriction}} : le bloc glisse et accélère de {{acceleration}}. Il commence à glisser au-delà de {{critical}}.',
  },
  convectionCell: {
    title: 'Cellule de convection',
    nusselt: 'Chaleur transportée (Nu)',
    vrms: 'Vitesse typique (Vrms)',
    time: 'Temps',
    timeMyr: 'Temps (millions d’années)',
    play: 'Lecture',
    pause: 'Pause',
    step: 'Avancer d’un pas',
    hot: 'Chaud',
    cold: 'Froid',
    estimate: 'estimation',
    speedUnit: 'cm/an',
    millionYears: '{{value}} millions d’années',
    describeStill:
      'Une boîte de roche du manteau, {{aspect}} fois plus large que profonde, chauffée par le bas et refroidie par le haut. Son nombre de Rayleigh vaut {{rayleigh}}, sous le seuil de {{onset}} qui déclenche la convection : la chaleur monte seulement par conduction et la roche reste immobile.',
    describeConvecting:
      'Une boîte de roche du manteau, {{aspect}} fois plus large que profonde, chauffée par le bas et refroidie par le haut. Son nombre de Rayleigh vaut {{rayleigh}}, au-dessus du seuil de {{onset}} qui déclenche la convection : la roche chaude monte, se refroidit en haut et redescend. Elle transporte environ {{nusselt}} fois plus de chaleur que la conduction seule (estimation).',
    describePhysical: 'La boîte a {{depth}} de profondeur ; la roche se déplace à environ {{speed}} et traverse la boîte en {{transit}} environ.',
    describeLive: 'En ce moment : chaleur transportée {{nusselt}}, vitesse typique {{vrms}}.',
    overlays: { streamlines: 'Lignes de courant', particles: 'Particules à la dérive', arrows: 'Flèches d’écoulement', none: 'Aucune surcouche' },
    ramps: { magma: 'Magma', seafloor: 'Fond marin', greys: 'Gris' },
  },
  states: { holds: 'tient', slides: 'glisse' },
};
