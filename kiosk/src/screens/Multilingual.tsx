import type { ReactNode } from 'react';
import type { TFunction } from 'i18next';
import { i18next, type KioskLanguage } from '../app/i18n';

/**
 * Says the same thing in each of the venue's languages at once, first language largest, so no
 * visitor has to wait for theirs to come round. Inside a button, pass `inline` (spans, not divs).
 */
export function Multilingual({ languages, inline = false, children }: {
  languages: readonly KioskLanguage[];
  inline?: boolean;
  children: (t: TFunction, primary: boolean, language: KioskLanguage) => ReactNode;
}) {
  const Line = inline ? 'span' : 'div';
  return (
    <>
      {languages.map((language, index) => (
        <Line key={language} lang={language} className={index === 0 ? 'ml-line ml-primary' : 'ml-line ml-secondary'}>
          {children(i18next.getFixedT(language), index === 0, language)}
        </Line>
      ))}
    </>
  );
}
