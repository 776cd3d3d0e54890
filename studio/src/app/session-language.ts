import { useEffect, useLayoutEffect, useRef } from 'react';
import { useSession } from '../api/session';
import { matchUiLanguage } from '@mantlepiece/shared';
import { i18next } from './i18n';

/**
 * When someone signs in (or their session is restored), the studio speaks the language they
 * chose. Only a new person triggers it: a choice in the language menu has already been applied.
 */
export function useSessionLanguage(): void {
  const { data: session } = useSession();
  const saved = useRef<string | undefined>(undefined);
  const uiLanguage = session?.user.uiLanguage;
  useLayoutEffect(() => {
    saved.current = uiLanguage;
  });
  const userId = session?.user.id;
  useEffect(() => {
    const language = matchUiLanguage([saved.current]);
    if (userId !== undefined && language) void i18next.changeLanguage(language);
  }, [userId]);
}
