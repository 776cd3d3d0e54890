import { makeStyles, tokens } from '@fluentui/react-components';
import { magma, seaFloor } from '../app/theme';

const useStyles = makeStyles({
  root: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalS, color: 'inherit', textDecoration: 'none' },
  name: { fontSize: tokens.fontSizeBase500, fontWeight: tokens.fontWeightSemibold, letterSpacing: '0.01em' },
  product: { fontWeight: tokens.fontWeightRegular, opacity: 0.85 },
});

/** A plate riding over a glowing mantle: the product's mark, drawn inline so no asset is fetched. */
export function Wordmark({ product }: { product?: string }) {
  const styles = useStyles();
  return (
    <span className={styles.root}>
      <svg width="28" height="28" viewBox="0 0 28 28" aria-hidden="true" focusable="false">
        <circle cx="14" cy="14" r="13" fill={seaFloor[60]} />
        <path d="M3 17a11 11 0 0 0 22 0z" fill={magma.background} />
        <rect x="4" y="12" width="20" height="3.5" rx="1.5" fill={seaFloor[150]} />
      </svg>
      <span className={styles.name}>
        Mantlepiece{product ? <span className={styles.product}> {product}</span> : null}
      </span>
    </span>
  );
}
