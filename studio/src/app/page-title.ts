import { useEffect } from 'react';
import { useTranslation } from 'react-i18next';

/** Names the browser tab after the page, so screen-reader users hear where a link took them. */
export function usePageTitle(title: string): void {
  const { t } = useTranslation();
  const appName = t('common.appName');
  useEffect(() => {
    document.title = `${title} · ${appName}`;
  }, [title, appName]);
}
