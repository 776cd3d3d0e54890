import { makeStyles, shorthands, Text, tokens } from '@fluentui/react-components';
import type { MediaView } from '@mantlepiece/shared';
import { Link } from 'react-router-dom';
import { MediaThumb } from '../../components/media/MediaThumb';
import { MediaBadges } from './MediaBadges';

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: 'repeat(auto-fill, minmax(13rem, 1fr))', gap: tokens.spacingHorizontalM, listStyle: 'none', margin: 0, padding: 0 },
  card: {
    display: 'flex', flexDirection: 'column', height: '100%', textDecoration: 'none', color: 'inherit', overflow: 'hidden',
    border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusLarge, backgroundColor: tokens.colorNeutralBackground1,
    ':hover': { ...shorthands.borderColor(tokens.colorNeutralStroke1), boxShadow: tokens.shadow4 },
    ':focus-visible': { outline: `2px solid ${tokens.colorStrokeFocus2}`, outlineOffset: '2px' },
  },
  body: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS, padding: tokens.spacingHorizontalM },
  name: { fontWeight: tokens.fontWeightSemibold, overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' },
  muted: { color: tokens.colorNeutralForeground3, fontSize: tokens.fontSizeBase200 },
});

export function MediaGrid({ assets }: { assets: MediaView[] }) {
  const styles = useStyles();
  return (
    <ul className={styles.grid}>
      {assets.map((asset) => (
        <li key={asset.id}>
          <Link to={`/media/${asset.id}`} className={styles.card}>
            <MediaThumb asset={asset} alt={Object.values(asset.alt)[0] ?? ''} />
            <span className={styles.body}>
              <Text className={styles.name} title={asset.filename}>{asset.filename}</Text>
              <Text className={styles.muted}>{`${asset.width} × ${asset.height}`}{asset.credit ? ` · ${asset.credit}` : ''}</Text>
              <MediaBadges asset={asset} />
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
