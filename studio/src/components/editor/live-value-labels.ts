import { useCallback } from 'react';
import { useTranslation } from 'react-i18next';

/** A widget output's name as a curator reads it ("Critical angle"), or its key when the studio has no wording yet. */
export function useLiveValueLabel(): (output: string) => string {
  const { t } = useTranslation();
  return useCallback(
    (output: string) => {
      const labels = t('editor.outputs', { returnObjects: true }) as Record<string, string>;
      return Object.hasOwn(labels, output) ? labels[output]! : output;
    },
    [t],
  );
}
