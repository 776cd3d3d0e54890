import { Badge, makeStyles, tokens } from '@fluentui/react-components';
import type { MediaView } from '@mantlepiece/shared';
import { useTranslation } from 'react-i18next';
import { EXPIRING_WITHIN_DAYS } from './list-params';
import { licenceExpiresWithin, todayIso } from './media-facts';

const useStyles = makeStyles({ badges: { display: 'flex', gap: tokens.spacingHorizontalXS, flexWrap: 'wrap' } });

/** What an asset still lacks before a panel may show it (renditions, alt text in any language, credit, licence, time on it), and whether it is in use. */
export function MediaBadges({ asset }: { asset: MediaView }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const badges = [
    asset.renditionStatus.state === 'pending' && <Badge key="preparing" appearance="tint" color="informative">{t('media.preparation.preparing')}</Badge>,
    asset.renditionStatus.state === 'failed' && <Badge key="failed" appearance="filled" color="danger">{t('media.preparation.failed')}</Badge>,
    !Object.values(asset.alt).some((text) => text.trim()) && <Badge key="alt" appearance="tint" color="danger">{t('media.badges.noAlt')}</Badge>,
    !asset.credit?.trim() && <Badge key="credit" appearance="tint" color="warning">{t('media.badges.noCredit')}</Badge>,
    !asset.licence && <Badge key="licence" appearance="tint" color="warning">{t('media.badges.noLicence')}</Badge>,
    licenceExpiresWithin(asset, EXPIRING_WITHIN_DAYS, todayIso()) && <Badge key="expiring" appearance="tint" color="severe">{t('media.badges.expiring', { date: asset.licenceExpiresOn })}</Badge>,
    asset.usedIn.length > 0 && <Badge key="used" appearance="outline" color="brand">{t('media.badges.used', { count: asset.usedIn.length })}</Badge>,
  ].filter(Boolean);
  return <span className={styles.badges}>{badges}</span>;
}
