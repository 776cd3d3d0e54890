import { SOURCES } from '../sources.js';
import type { ModelCard } from '../types.js';

export const seaFloorDepthModel: ModelCard = {
  equations: [
    'd = d_ridge + 2ρm·αv·ΔT / (ρm − ρw) · √(κt / π)',
    'q = k·ΔT / √(πκt)',
    'y_L = 2.32·√(κt)',
    'GDH1: d = 2600 + 365·√t m (t < 20 Myr); d = 5651 − 2473·e^(−0.0278·t) m (t ≥ 20 Myr)',
    'GDH1: q = 510 / √t mW/m² (t ≤ 55 Myr); q = 48 + 96·e^(−0.0278·t) mW/m² (t > 55 Myr)',
  ],
  sources: [SOURCES.turcotteSchubert, SOURCES.steinStein1992, SOURCES.parsonsSclater1977],
  words: {
    en: {
      summary:
        'New sea floor forms hot at a ridge. As it moves away it cools, shrinks and sinks, and less heat comes out of it. The half-space model lets the rock cool for ever; the plate model (GDH1) stops the cooling at a plate 95 km thick, which fits old sea floor better.',
      equations: [
        'Depth below sea level of a cooling half-space, t its age',
        'Heat flowing out of the sea floor, half-space model',
        'Thickness of the cooled lithosphere (where it is back to 90 % of the mantle’s temperature)',
        'Depth in the plate model, fitted to depths measured all over the oceans',
        'Heat flow in the plate model, fitted to measured heat flow',
      ],
      assumptions: [
        'Rock cools only by conduction upwards; no sideways heat flow.',
        'The floor floats on the mantle (isostasy); sediment, volcanoes and hot spots are left out.',
        'Properties do not change with temperature or depth.',
      ],
      range: [
        'The half-space model matches depths up to about 70 Myr (Parsons and Sclater 1977); older floor is shallower than it predicts.',
        'Near the ridge, sea water circulating through the rock carries heat away, so measured heat flow is lower and scattered.',
        'Hardly any sea floor is older than about 180 Myr.',
      ],
    },
    fr: {
      summary:
        'Le nouveau fond marin naît chaud à une dorsale. En s’éloignant, il refroidit, se contracte et s’enfonce, et il laisse échapper moins de chaleur. Le modèle du demi-espace le laisse refroidir sans fin ; le modèle de plaque (GDH1) arrête le refroidissement à une plaque de 95 km d’épaisseur, ce qui convient mieux au fond ancien.',
      equations: [
        'Profondeur sous le niveau de la mer d’un demi-espace qui refroidit, t son âge',
        'Chaleur qui sort du fond marin, modèle du demi-espace',
        'Épaisseur de la lithosphère refroidie (là où elle retrouve 90 % de la température du manteau)',
        'Profondeur dans le modèle de plaque, ajustée aux profondeurs mesurées dans tous les océans',
        'Flux de chaleur dans le modèle de plaque, ajusté aux flux mesurés',
      ],
      assumptions: [
        'La roche ne refroidit que par conduction vers le haut, sans flux de chaleur latéral.',
        'Le fond flotte sur le manteau (isostasie) ; sédiments, volcans et points chauds sont laissés de côté.',
        'Les propriétés ne changent ni avec la température ni avec la profondeur.',
      ],
      range: [
        'Le modèle du demi-espace suit les profondeurs jusqu’à environ 70 Ma (Parsons et Sclater 1977) ; le fond plus ancien est moins profond que prévu.',
        'Près de la dorsale, l’eau de mer qui circule dans la roche emporte de la chaleur : le flux mesuré y est plus faible et dispersé.',
        'Presque aucun fond marin n’a plus d’environ 180 Ma.',
      ],
    },
    es: {
      summary:
        'El fondo marino nuevo nace caliente en una dorsal. Al alejarse se enfría, se encoge y se hunde, y deja salir menos calor. El modelo del semiespacio lo deja enfriarse sin fin; el modelo de placa (GDH1) detiene el enfriamiento en una placa de 95 km de espesor, que se ajusta mejor al fondo antiguo.',
      equations: [
        'Profundidad bajo el nivel del mar de un semiespacio que se enfría, t su edad',
        'Calor que sale del fondo marino, modelo del semiespacio',
        'Espesor de la litosfera enfriada (donde vuelve al 90 % de la temperatura del manto)',
        'Profundidad en el modelo de placa, ajustada a profundidades medidas en todos los océanos',
        'Flujo de calor en el modelo de placa, ajustado a flujos medidos',
      ],
      assumptions: [
        'La roca se enfría solo por conducción hacia arriba, sin flujo de calor lateral.',
        'El fondo flota sobre el manto (isostasia); se dejan fuera sedimentos, volcanes y puntos calientes.',
        'Las propiedades no cambian con la temperatura ni con la profundidad.',
      ],
      range: [
        'El modelo del semiespacio sigue las profundidades hasta unos 70 Ma (Parsons y Sclater 1977); el fondo más antiguo es menos profundo de lo que predice.',
        'Cerca de la dorsal, el agua de mar que circula por la roca se lleva calor, así que el flujo medido es menor y disperso.',
        'Casi no hay fondo marino de más de unos 180 Ma.',
      ],
    },
    ar: {
      summary:
        'يتكوّن قاع البحر الجديد ساخنًا عند الحيد المحيطي. وكلما ابتعد عنه برد وانكمش وهبط، وقلّت الحرارة الخارجة منه. نموذج نصف الفضاء يترك الصخر يبرد بلا نهاية؛ أما نموذج الصفيحة (GDH1) فيوقف التبريد عند صفيحة سمكها 95 كم، وهو أنسب لقاع البحر القديم.',
      equations: [
        'عمق نصف فضاء يبرد تحت سطح البحر، حيث t عمره',
        'الحرارة الخارجة من قاع البحر، نموذج نصف الفضاء',
        'سمك الغلاف الصخري المبرَّد (حيث تعود حرارته إلى 90 % من حرارة الوشاح)',
        'العمق في نموذج الصفيحة، مطابَقًا لأعماق قيست في المحيطات كلها',
        'تدفق الحرارة في نموذج الصفيحة، مطابَقًا لتدفقات مقيسة',
      ],
      assumptions: [
        'يبرد الصخر بالتوصيل نحو الأعلى فقط، دون تدفق حرارة جانبي.',
        'يطفو القاع على الوشاح (التوازن التوازني)؛ وتُهمَل الرواسب والبراكين والنقاط الساخنة.',
        'لا تتغير الخصائص مع الحرارة ولا مع العمق.',
      ],
      range: [
        'يوافق نموذج نصف الفضاء الأعماق حتى نحو 70 مليون سنة (بارسونز وسكلاتر 1977)؛ والقاع الأقدم أقل عمقًا مما يتوقع.',
        'قرب الحيد تحمل مياه البحر الجارية في الصخر الحرارة بعيدًا، فيكون التدفق المقيس أقل ومتفرقًا.',
        'لا يكاد يوجد قاع بحر أقدم من نحو 180 مليون سنة.',
      ],
    },
  },
};
