import { Badge, Tooltip } from '@fluentui/react-components';
import { useTranslation } from 'react-i18next';

/** Marks the demo venue's invented kiosk, so nobody mistakes its figures for a real screen's. */
export function DemoBadge() {
  const { t } = useTranslation();
  return (
    <Tooltip content={t('fleet.demoHint')} relationship="description" withArrow>
      <Badge appearance="outline" color="informative" data-demo="" tabIndex={0}>{t('fleet.demo')}</Badge>
    </Tooltip>
  );
}
