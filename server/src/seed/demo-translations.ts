import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { SourceUnitsService } from '../translations/source-units.service.js';
import { TranslationsService } from '../translations/translations.service.js';
import { Story } from '../stories/models/story.model.js';
import { User } from '../users/models/user.model.js';
import { VenueMembership } from '../users/models/venue-membership.model.js';

/**
 * Our own French and Spanish for the demo stories: per story, per panel, each text unit in the
 * order the panel is cut (headings and paragraphs as they appear). `{1}` and `{2}` are the live
 * values of the source, moved where each language puts them.
 */
const DEMO_TRANSLATIONS: Record<string, Record<'fr' | 'es', string[][]>> = {
  'Why Does Rock Deep Inside Earth Move?': {
    fr: [
      ['La roche chaude monte', 'Sous vos pieds, la roche du manteau est chaude. Sur une très longue durée, elle peut couler, comme un caramel épais. La chaleur du noyau la réchauffe par en dessous.'],
      [
        'Regardez-la se retourner',
        'Cette boîte de roche est chauffée par en dessous. La roche chaude est plus légère, alors elle monte. La roche froide est plus lourde, alors elle descend.',
        'Son nombre de Rayleigh est de {1}. Au-delà d’environ {2}, la roche commence à se retourner.',
      ],
      ['Un tapis roulant très lent', 'Le manteau ne bouge que de quelques centimètres par an, à peu près à la vitesse où poussent vos ongles. En des millions d’années, cela déplace des plaques entières autour du globe.'],
    ],
    es: [
      ['La roca caliente sube', 'Bajo tus pies, la roca del manto está caliente. Con muchísimo tiempo puede fluir, como un caramelo espeso. El calor del núcleo la calienta desde abajo.'],
      [
        'Mira cómo se da la vuelta',
        'Esta caja de roca se calienta desde abajo. La roca caliente pesa menos, así que sube. La roca fría pesa más, así que baja.',
        'Su número de Rayleigh es {1}. Por encima de unos {2}, la roca empieza a darse la vuelta.',
      ],
      ['Una cinta transportadora lenta', 'El manto se mueve solo unos centímetros al año, más o menos lo que crecen tus uñas. En millones de años, eso lleva placas enteras de un lado a otro del planeta.'],
    ],
  },
  'Sliding Off the Ridge': {
    fr: [
      ['Une chaîne de montagnes sous la mer', 'Une longue chaîne de montagnes court au milieu des océans. Un nouveau fond marin se forme à son sommet. En s’éloignant, il refroidit, se contracte et s’enfonce.'],
      ['Quand un bloc glisse-t-il ?', 'Un bloc commence à glisser quand sa pente est plus raide que {1}. Cette pente est plus raide, donc le bloc glisse. Essayez une pente plus douce.'],
      ['La plaque glisse aussi', 'Les vraies pentes des dorsales sont très douces, et ce modèle est simplifié. Mais la gravité tire quand même la plaque vers le bas, loin de la dorsale, et l’aide à bouger.'],
    ],
    es: [
      ['Una cordillera bajo el mar', 'Una larga cadena de montañas recorre el centro de los océanos. En su cima se forma fondo marino nuevo. Al alejarse, se enfría, se encoge y se hunde.'],
      ['¿Cuándo se desliza un bloque?', 'Un bloque empieza a deslizarse cuando su pendiente es más empinada que {1}. Esta pendiente lo es, así que el bloque se desliza. Prueba una pendiente más suave.'],
      ['La placa también se desliza', 'Las laderas reales de las dorsales son muy suaves, y este modelo está simplificado. Pero la gravedad sigue tirando de la placa hacia abajo y lejos de la dorsal, y la ayuda a moverse.'],
    ],
  },
  'Sinking Slabs': {
    fr: [
      ['Les vieilles plaques s’enfoncent', 'Loin de la dorsale, une plaque océanique est vieille, froide et lourde. Dans une fosse profonde, elle se courbe et plonge dans le manteau.'],
      ['Le vieux fond marin est profond', 'Un fond marin aussi vieux se trouve à {1} de profondeur. La roche froide dessous a {2} d’épaisseur. Faites glisser vers un fond plus vieux et regardez-le s’enfoncer.'],
      ['La plaque plongeante tire sa plaque', 'Ici, la plaque qui plonge tire environ {1} fois plus fort que la dorsale ne pousse. Raccourcissez la plaque plongeante et voyez qui l’emporte.'],
    ],
    es: [
      ['Las placas viejas se hunden', 'Lejos de la dorsal, una placa oceánica es vieja, fría y pesada. En una fosa profunda se dobla y se hunde en el manto.'],
      ['El fondo marino viejo está hondo', 'Un fondo marino tan viejo está a {1} de profundidad. La roca fría de debajo tiene {2} de espesor. Arrastra hacia un fondo más viejo y mira cómo se hunde.'],
      ['La placa que se hunde tira de su placa', 'Aquí la placa que se hunde tira unas {1} veces más fuerte de lo que empuja la dorsal. Acorta la placa hundida y mira quién gana.'],
    ],
  },
};

/** The demo stories' titles, which the kiosk's story menu shows in the visitor's language. */
const DEMO_TITLES: Record<string, Record<'fr' | 'es', string>> = {
  'Why Does Rock Deep Inside Earth Move?': { fr: 'Pourquoi la roche bouge-t-elle au fond de la Terre ?', es: '¿Por qué se mueve la roca en el interior de la Tierra?' },
  'Sliding Off the Ridge': { fr: 'Glisser depuis la dorsale', es: 'Deslizarse desde la dorsal' },
  'Sinking Slabs': { fr: 'Les plaques qui plongent', es: 'Las placas que se hunden' },
};

/**
 * The demo stories in French and Spanish, saved through the translation service as the demo
 * translator, so the demo venue is complete for a release. The images' alt texts in both languages
 * came with the media; saving them here records the source they were written from.
 */
@Injectable()
export class DemoTranslations {
  constructor(
    @InjectModel(Story) private readonly stories: typeof Story,
    @InjectModel(User) private readonly users: typeof User,
    private readonly sources: SourceUnitsService,
    private readonly translations: TranslationsService,
  ) {}

  async seed(translatorEmail: string): Promise<void> {
    const translator = await this.users.findOne({ where: { email: translatorEmail }, include: [VenueMembership] });
    if (!translator) throw new Error('the demo translator must exist before the demo translations');
    for (const [title, byLocale] of Object.entries(DEMO_TRANSLATIONS)) {
      const story = await this.stories.findOne({ where: { title } });
      if (!story) throw new Error(`the demo story "${title}" must exist before its translations`);
      const source = await this.sources.sourceOf(story.id);
      for (const [locale, panels] of Object.entries(byLocale)) {
        const states = await this.translations.statesOf(source, locale);
        for (const state of states) {
          const text = state.unit.kind === 'storyTitle'
            ? DEMO_TITLES[title]?.[locale as 'fr' | 'es']
            : state.mediaId === null
              ? panels[state.panelNumber! - 1]?.[source.panels[state.panelNumber! - 1]!.units.indexOf(state.unit)]
              : state.translation?.text;
          if (text === undefined) throw new Error(`the demo has no ${locale} text for unit ${state.unit.id} of "${title}"`);
          await this.translations.saveUnit(translator, story.id, locale, state.unit.id, { text, version: state.own?.version ?? 0 });
        }
      }
    }
  }
}
