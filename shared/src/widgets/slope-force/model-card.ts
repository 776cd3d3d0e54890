import { SOURCES } from '../sources.js';
import type { ModelCard } from '../types.js';

export const slopeForceModel: ModelCard = {
  equations: ['W = m·g', 'N = W·cos θ,  S = W·sin θ', 'holds while S ≤ μs·N, so it slides above θc = arctan μs', 'a = g·(sin θ − μk·cos θ)'],
  sources: [SOURCES.cgpm1901, SOURCES.byerlee1978],
  words: {
    en: {
      summary:
        'A block on a tilted surface: its weight splits into a part that presses into the slope and a part that pulls it down the slope. Friction holds it until the slope is steeper than a critical angle; then it slides and speeds up.',
      equations: ['Weight of the block', 'The part pressing into the slope and the part pulling down it', 'When friction holds, and the angle where sliding starts', 'How fast a sliding block speeds up'],
      assumptions: ['One rigid block on a flat, straight slope.', 'Friction follows Coulomb’s rule, with one coefficient at rest and one while sliding.', 'No air, no rolling, no water in the contact.'],
      range: ['Rock on rock grips with a coefficient of about 0.6 to 0.85 (Byerlee 1978); much higher values describe rubber, not rock.', 'A real plate is not a block on a slope: this is an analogy for the pull of gravity.'],
    },
    fr: {
      summary:
        'Un bloc sur une surface inclinée : son poids se partage entre une part qui appuie sur la pente et une part qui le tire vers le bas. Le frottement le retient jusqu’à ce que la pente dépasse un angle critique ; ensuite il glisse et accélère.',
      equations: ['Poids du bloc', 'La part qui appuie sur la pente et celle qui le tire vers le bas', 'Quand le frottement retient, et l’angle où le glissement commence', 'L’accélération d’un bloc qui glisse'],
      assumptions: ['Un seul bloc rigide sur une pente plane et droite.', 'Le frottement suit la loi de Coulomb, avec un coefficient au repos et un en glissement.', 'Ni air, ni roulement, ni eau dans le contact.'],
      range: ['La roche sur la roche a un coefficient d’environ 0,6 à 0,85 (Byerlee 1978) ; des valeurs bien plus fortes décrivent du caoutchouc, pas de la roche.', 'Une vraie plaque n’est pas un bloc sur une pente : c’est une analogie pour la traction de la gravité.'],
    },
    es: {
      summary:
        'Un bloque sobre una superficie inclinada: su peso se reparte entre una parte que presiona contra la pendiente y otra que tira de él pendiente abajo. El rozamiento lo sujeta hasta que la pendiente supera un ángulo crítico; entonces se desliza y acelera.',
      equations: ['Peso del bloque', 'La parte que presiona contra la pendiente y la que tira hacia abajo', 'Cuándo sujeta el rozamiento, y el ángulo en que empieza a deslizarse', 'Cuánto acelera un bloque que se desliza'],
      assumptions: ['Un solo bloque rígido sobre una pendiente plana y recta.', 'El rozamiento sigue la ley de Coulomb, con un coeficiente en reposo y otro al deslizar.', 'Sin aire, sin rodar, sin agua en el contacto.'],
      range: ['La roca sobre roca tiene un coeficiente de unos 0,6 a 0,85 (Byerlee 1978); valores mucho mayores describen caucho, no roca.', 'Una placa real no es un bloque en una pendiente: es una analogía del tirón de la gravedad.'],
    },
    ar: {
      summary:
        'صندوق على سطح مائل: ينقسم وزنه إلى جزء يضغط على المنحدر وجزء يشدّه إلى أسفل المنحدر. يمسكه الاحتكاك حتى يصبح المنحدر أشد من زاوية حرجة، فينزلق ويتسارع.',
      equations: ['وزن الصندوق', 'الجزء الضاغط على المنحدر والجزء الشادّ إلى أسفله', 'متى يمسك الاحتكاك، والزاوية التي يبدأ عندها الانزلاق', 'تسارع الصندوق المنزلق'],
      assumptions: ['صندوق صلب واحد على منحدر مستوٍ ومستقيم.', 'يتبع الاحتكاك قاعدة كولوم، بمعامل للسكون وآخر للانزلاق.', 'لا هواء ولا تدحرج ولا ماء في التماس.'],
      range: ['معامل احتكاك الصخر بالصخر نحو 0.6 إلى 0.85 (بايرلي 1978)؛ والقيم الأعلى بكثير تصف المطاط لا الصخر.', 'الصفيحة الحقيقية ليست صندوقًا على منحدر: هذا تشبيه لشدّ الجاذبية.'],
    },
  },
};
