import { describe, expect, it } from 'vitest';
import { i18next } from '../../app/i18n';

describe('the Insights note on demo visits', () => {
  // Expected digits and separators from Intl.NumberFormat of each language (CLDR), the same figures the tables show.
  it.each(['en', 'fr', 'es', 'ar'])('writes the number of demo events as %s writes numbers', (language) => {
    const text = i18next.getFixedT(language)('insights.demoEvents', { count: 4735 });
    expect(text).toContain(new Intl.NumberFormat(language).format(4735));
  });
});
