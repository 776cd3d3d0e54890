import { makeStyles, tokens } from '@fluentui/react-components';
import type { MediaView } from '@mantlepiece/shared';

const useStyles = makeStyles({
  image: { display: 'block', width: '100%', aspectRatio: '4 / 3', objectFit: 'cover', backgroundColor: tokens.colorNeutralBackground4, backgroundSize: 'cover' },
});

/** The smallest rendition, over the blurred placeholder while it loads. */
export function MediaThumb({ asset, alt }: { asset: MediaView; alt: string }) {
  const styles = useStyles();
  const smallest = [...asset.renditions].sort((a, b) => a.width - b.width)[0];
  return (
    <img
      className={styles.image}
      src={smallest?.url ?? asset.placeholder}
      alt={alt}
      loading="lazy"
      decoding="async"
      style={{ backgroundImage: `url("${asset.placeholder}")` }}
    />
  );
}
