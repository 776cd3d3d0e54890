import { SOURCES } from '../sources.js';
import type { ModelCard } from '../types.js';

export const convectionCellModel: ModelCard = {
  equations: ['Ra = ρ·g·α·ΔT·d³ / (κ·η)', 'Ra_c = 27π⁴/4 ≈ 657.5 (wide layer, free-slip walls)', 'Nu ∝ Ra^(1/3),  Vrms ∝ Ra^(2/3)'],
  sources: [SOURCES.chandrasekhar1961, SOURCES.blankenbach1989, SOURCES.turcotteSchubert],
  words: {
    en: {
      summary:
        'A box of mantle rock heated from below and cooled from above. When the Rayleigh number is high enough, warm rock rises and cool rock sinks in slow loops that carry heat upwards. The simulation solves the flow step by step, checked against a published benchmark.',
      equations: ['Rayleigh number: how strongly buoyancy drives the flow against stiffness and heat leaking away', 'The Rayleigh number above which convection starts', 'How heat carried and speed grow with the Rayleigh number (boundary-layer estimate)'],
      assumptions: ['Rock flows like a very thick liquid with one viscosity everywhere.', 'Walls let rock slide along them; the top and bottom are held at fixed temperatures, the sides let no heat through.', 'Inertia is ignored, as it is for the mantle; no heat is made inside the rock.'],
      range: ['Below the onset Rayleigh number nothing moves, and heat only conducts.', 'Checked against Blankenbach et al. (1989) at Ra = 10⁴; at very high Ra the grid must be fine enough to follow thin boundary layers.'],
    },
    fr: {
      summary:
        'Une boîte de roche du manteau chauffée par en dessous et refroidie par au-dessus. Quand le nombre de Rayleigh est assez grand, la roche chaude monte et la roche froide descend en lentes boucles qui portent la chaleur vers le haut. La simulation calcule l’écoulement pas à pas, vérifiée sur un test de référence publié.',
      equations: ['Nombre de Rayleigh : la force de la flottabilité face à la viscosité et à la diffusion de la chaleur', 'Le nombre de Rayleigh au-delà duquel la convection démarre', 'Comment la chaleur transportée et la vitesse croissent avec le nombre de Rayleigh (estimation par couche limite)'],
      assumptions: ['La roche coule comme un liquide très épais, de même viscosité partout.', 'La roche glisse le long des parois ; le haut et le bas sont à température fixe, les côtés ne laissent pas passer la chaleur.', 'L’inertie est négligée, comme pour le manteau ; la roche ne produit pas de chaleur.'],
      range: ['Sous le nombre de Rayleigh critique, rien ne bouge et la chaleur ne fait que se conduire.', 'Vérifiée sur Blankenbach et al. (1989) à Ra = 10⁴ ; à Ra très grand, la grille doit être assez fine pour suivre les couches limites minces.'],
    },
    es: {
      summary:
        'Una caja de roca del manto calentada desde abajo y enfriada desde arriba. Cuando el número de Rayleigh es bastante alto, la roca caliente sube y la fría baja en lentos bucles que llevan el calor hacia arriba. La simulación resuelve el flujo paso a paso, comprobada con una prueba de referencia publicada.',
      equations: ['Número de Rayleigh: cuánto impulsa la flotabilidad el flujo frente a la viscosidad y la pérdida de calor', 'El número de Rayleigh a partir del cual empieza la convección', 'Cómo crecen el calor transportado y la velocidad con el número de Rayleigh (estimación de capa límite)'],
      assumptions: ['La roca fluye como un líquido muy espeso, con la misma viscosidad en todas partes.', 'La roca se desliza a lo largo de las paredes; arriba y abajo la temperatura es fija, los lados no dejan pasar el calor.', 'Se ignora la inercia, como en el manto; la roca no produce calor.'],
      range: ['Por debajo del número de Rayleigh crítico nada se mueve y el calor solo se conduce.', 'Comprobada con Blankenbach et al. (1989) a Ra = 10⁴; con Ra muy alto la malla debe ser lo bastante fina para seguir las capas límite delgadas.'],
    },
    ar: {
      summary:
        'صندوق من صخر الوشاح يُسخَّن من الأسفل ويُبرَّد من الأعلى. عندما يكون عدد رايلي كبيرًا بما يكفي، يصعد الصخر الساخن ويهبط البارد في حلقات بطيئة تحمل الحرارة إلى الأعلى. تحسب المحاكاة الجريان خطوة بخطوة، وقد فُحصت مقابل اختبار مرجعي منشور.',
      equations: ['عدد رايلي: مدى قوة الطفو في دفع الجريان مقابل اللزوجة وتسرّب الحرارة', 'عدد رايلي الذي يبدأ فوقه الحمل الحراري', 'كيف تكبر الحرارة المنقولة والسرعة مع عدد رايلي (تقدير الطبقة الحدية)'],
      assumptions: ['يجري الصخر كسائل كثيف جدًا بلزوجة واحدة في كل مكان.', 'ينزلق الصخر على الجدران؛ والأعلى والأسفل بحرارة ثابتة، والجانبان لا يمرّران الحرارة.', 'يُهمَل القصور الذاتي كما في الوشاح؛ ولا يولّد الصخر حرارة.'],
      range: ['تحت عدد رايلي الحرج لا يتحرك شيء، وتنتقل الحرارة بالتوصيل فقط.', 'فُحصت مقابل بلانكنباخ وزملائه (1989) عند Ra = 10⁴؛ وعند Ra كبير جدًا يجب أن تكون الشبكة دقيقة بما يكفي لتتبّع الطبقات الحدية الرقيقة.'],
    },
  },
};
