import { SOURCES } from '../sources.js';
import type { ModelCard } from '../types.js';

export const plateForcesModel: ModelCard = {
  equations: ['F_RP = g·ρm·αv·ΔT·κ·t·[1 + 2ρm·αv·ΔT / (π(ρm − ρw))]', 'F_SP = ρm·αv·g · 2ΔT·√(κt / π) · L', 'F_SP / F_RP'],
  sources: [SOURCES.turcotteSchubert, SOURCES.forsythUyeda1975],
  words: {
    en: {
      summary:
        'Two pushes and pulls of gravity move a plate. At the ridge, warm, raised rock pushes the older plate sideways: ridge push. At a trench, the cold slab is heavier than the mantle around it and drags its plate down: slab pull. Both grow as the plate ages; the pull also grows with the slab’s length.',
      equations: [
        'Ridge push per metre of ridge on a plate of age t (cooling half-space)',
        'Slab pull per metre of trench: the slab’s extra weight from being colder, over its length L',
        'How many times bigger the pull is than the push',
      ],
      assumptions: [
        'Plate and slab cool as a half-space; the slab keeps the temperature it had at the trench.',
        'Only the weight from cooling counts; mineral phase changes deep down, which add to the pull, are left out.',
        'Nothing resists: in the Earth the mantle’s drag, the bending at the trench and friction balance much of the pull.',
      ],
      range: [
        'Order-of-magnitude estimates only, for plates a few tens of millions of years old or more.',
        'Below about 660 km the mantle is stiffer and minerals change phase, so a longer slab is a rougher estimate.',
      ],
    },
    fr: {
      summary:
        'Deux effets de la gravité font bouger une plaque. À la dorsale, la roche chaude et surélevée pousse sur le côté la plaque plus vieille : la poussée à la dorsale. À une fosse, la plaque froide qui plonge est plus lourde que le manteau autour et entraîne sa plaque vers le bas : la traction. Les deux augmentent avec l’âge de la plaque ; la traction augmente aussi avec la longueur de la partie plongeante.',
      equations: [
        'Poussée à la dorsale par mètre de dorsale, pour une plaque d’âge t (demi-espace qui refroidit)',
        'Traction par mètre de fosse : le surpoids de la plaque plongeante, plus froide, sur sa longueur L',
        'Combien de fois la traction dépasse la poussée',
      ],
      assumptions: [
        'La plaque refroidit comme un demi-espace ; la partie plongeante garde la température qu’elle avait à la fosse.',
        'Seul le poids dû au refroidissement compte ; les changements de phase des minéraux en profondeur, qui augmentent la traction, sont laissés de côté.',
        'Rien ne freine : dans la Terre, le frottement du manteau, la flexion à la fosse et les frottements compensent une grande partie de la traction.',
      ],
      range: [
        'Estimations à un ordre de grandeur près, pour des plaques de quelques dizaines de millions d’années ou plus.',
        'Sous environ 660 km, le manteau est plus rigide et les minéraux changent de phase : une plaque plongeante plus longue donne une estimation plus grossière.',
      ],
    },
    es: {
      summary:
        'Dos efectos de la gravedad mueven una placa. En la dorsal, la roca caliente y elevada empuja de lado a la placa más vieja: el empuje de la dorsal. En una fosa, la placa fría que se hunde pesa más que el manto que la rodea y arrastra su placa hacia abajo: el tirón. Ambos crecen con la edad de la placa; el tirón también crece con la longitud de la parte que se hunde.',
      equations: [
        'Empuje de la dorsal por metro de dorsal, para una placa de edad t (semiespacio que se enfría)',
        'Tirón por metro de fosa: el peso extra de la placa hundida, más fría, a lo largo de su longitud L',
        'Cuántas veces es mayor el tirón que el empuje',
      ],
      assumptions: [
        'La placa se enfría como un semiespacio; la parte hundida conserva la temperatura que tenía en la fosa.',
        'Solo cuenta el peso debido al enfriamiento; se dejan fuera los cambios de fase de los minerales en profundidad, que aumentan el tirón.',
        'Nada frena: en la Tierra, el arrastre del manto, la flexión en la fosa y el rozamiento compensan gran parte del tirón.',
      ],
      range: [
        'Solo estimaciones del orden de magnitud, para placas de unas decenas de millones de años o más.',
        'Por debajo de unos 660 km el manto es más rígido y los minerales cambian de fase, así que una placa hundida más larga da una estimación más burda.',
      ],
    },
    ar: {
      summary:
        'تحرّك الجاذبيةُ الصفيحةَ بطريقتين. عند الحيد يدفع الصخر الساخن المرتفع الصفيحةَ الأقدم جانبًا: دفع الحيد. وعند الخندق يكون اللوح البارد أثقل من الوشاح حوله فيجرّ صفيحته إلى الأسفل: شدّ اللوح. يكبر كلاهما مع عمر الصفيحة، ويكبر الشدّ أيضًا مع طول اللوح.',
      equations: [
        'دفع الحيد لكل متر من الحيد على صفيحة عمرها t (نصف فضاء يبرد)',
        'شدّ اللوح لكل متر من الخندق: الوزن الزائد للوح لأنه أبرد، على طوله L',
        'كم مرة يزيد الشدّ على الدفع',
      ],
      assumptions: [
        'تبرد الصفيحة كنصف فضاء، ويحتفظ اللوح بالحرارة التي كانت له عند الخندق.',
        'لا يُحسب إلا الوزن الناتج عن التبريد؛ وتُهمَل تغيّرات أطوار المعادن في الأعماق التي تزيد الشدّ.',
        'لا شيء يقاوم: في الأرض تعادل مقاومة الوشاح والانثناء عند الخندق والاحتكاك كثيرًا من الشدّ.',
      ],
      range: [
        'تقديرات بمرتبة الحجم فقط، لصفائح عمرها بضع عشرات ملايين السنين أو أكثر.',
        'تحت نحو 660 كم يكون الوشاح أصلب وتتغير أطوار المعادن، فيصبح تقدير اللوح الأطول أكثر خشونة.',
      ],
    },
  },
};
