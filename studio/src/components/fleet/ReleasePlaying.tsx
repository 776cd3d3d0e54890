import { makeStyles, Text, tokens } from '@fluentui/react-components';
import { ClockDismissFilled, WarningFilled } from '@fluentui/react-icons';
import { useTranslation } from 'react-i18next';
import type { Schema } from '../../api/client';

type FleetKioskView = Schema<'FleetKioskView'>;

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  mismatch: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS, color: tokens.colorPaletteDarkOrangeForeground1, fontWeight: tokens.fontWeightSemibold },
  muted: { color: tokens.colorNeutralForeground3 },
});

/**
 * The release on the screen, and under it the live one when they differ, and the kiosk's word that
 * its publication expired (in words and an icon each).
 */
export function ReleasePlaying({ kiosk }: { kiosk: Pick<FleetKioskView, 'releasePlaying' | 'releaseLive' | 'playsLiveRelease' | 'revokedAt' | 'publication'> }) {
  const { t } = useTranslation();
  const styles = useStyles();
  const playing = kiosk.releasePlaying ? t('fleet.release', { number: kiosk.releasePlaying.number }) : t('fleet.noRelease');
  const mismatch = !kiosk.revokedAt && !kiosk.playsLiveRelease && kiosk.releaseLive !== null;
  return (
    <span className={styles.root} data-mismatch={mismatch || undefined}>
      <Text>{playing}</Text>
      {mismatch ? (
        <span className={styles.mismatch}>
          <WarningFilled aria-hidden />
          {t('fleet.mismatch')} · {t('fleet.live', { number: kiosk.releaseLive!.number })}
        </span>
      ) : kiosk.releaseLive === null ? <Text size={200} className={styles.muted}>{t('fleet.noLive')}</Text> : null}
      {!kiosk.revokedAt && kiosk.publication?.expired ? (
        <span className={styles.mismatch} data-publication-expired={kiosk.publication.sequence}>
          <ClockDismissFilled aria-hidden />
          {t('fleet.publicationExpired', { sequence: kiosk.publication.sequence })}
        </span>
      ) : null}
    </span>
  );
}
