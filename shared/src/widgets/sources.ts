import type { ModelSource } from './types.js';

/**
 * The published works the widgets' models rest on. Citations as the works print them; the DOIs are
 * written from memory (the Stein and Stein one matches the Nature volume and page), not copied
 * from a database at hand.
 */
export const SOURCES = {
  turcotteSchubert: { citation: 'Turcotte, D. L. and Schubert, G. (2014). Geodynamics, 3rd edition. Cambridge University Press.', doi: '10.1017/CBO9780511843877' },
  steinStein1992: {
    citation: 'Stein, C. A. and Stein, S. (1992). A model for the global variation in oceanic depth and heat flow with lithospheric age. Nature 359, 123–129.',
    doi: '10.1038/359123a0',
  },
  parsonsSclater1977: {
    citation: 'Parsons, B. and Sclater, J. G. (1977). An analysis of the variation of ocean floor bathymetry and heat flow with age. Journal of Geophysical Research 82, 803–827.',
    doi: '10.1029/JB082i005p00803',
  },
  forsythUyeda1975: {
    citation: 'Forsyth, D. and Uyeda, S. (1975). On the relative importance of the driving forces of plate motion. Geophysical Journal of the Royal Astronomical Society 43, 163–200.',
    doi: '10.1111/j.1365-246X.1975.tb00631.x',
  },
  byerlee1978: { citation: 'Byerlee, J. (1978). Friction of rocks. Pure and Applied Geophysics 116, 615–626.', doi: '10.1007/BF00876528' },
  cgpm1901: { citation: 'Comptes rendus de la 3e Conférence générale des poids et mesures (1901): standard acceleration of gravity, 9.80665 m/s².' },
  chandrasekhar1961: { citation: 'Chandrasekhar, S. (1961). Hydrodynamic and Hydromagnetic Stability. Oxford, Clarendon Press.' },
  blankenbach1989: {
    citation: 'Blankenbach, B. et al. (1989). A benchmark comparison for mantle convection codes. Geophysical Journal International 98, 23–38.',
    doi: '10.1111/j.1365-246X.1989.tb05511.x',
  },
} satisfies Record<string, ModelSource>;
