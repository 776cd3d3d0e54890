import { Tooltip } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';
import { useDateFormat } from '../formatting';
import { relativeTime } from './relative-time';

/** "12 seconds ago", with the date and time on hover and in a `<time>` for assistive technology. */
export function LastHeartbeat({ at, now }: { at: string | null; now: Date }) {
  const { t, i18n } = useTranslation();
  const formatDate = useDateFormat();
  if (!at) return <>{t('fleet.never')}</>;
  return (
    <Tooltip content={formatDate(at)} relationship="description">
      <time dateTime={at}>{relativeTime(at, now, i18n.resolvedLanguage ?? 'en')}</time>
    </Tooltip>
  );
}
