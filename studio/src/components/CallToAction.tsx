import { makeStyles, mergeClasses, type ButtonProps } from '@fluentui/react-components';
import type { To } from 'react-router-dom';
import { magma } from '../app/theme';
import { LinkButton } from './links';

const useStyles = makeStyles({
  magma: {
    backgroundColor: magma.background,
    color: magma.foregroundOnMagma,
    ':hover': { backgroundColor: magma.backgroundHover, color: magma.foregroundOnMagma },
    ':hover:active': { backgroundColor: magma.backgroundPressed, color: magma.foregroundOnMagma },
  },
});

/** The one thing a screen most wants done, in magma orange. One per screen at most. */
export function CallToAction({ to, className, ...props }: Omit<ButtonProps, 'as' | 'href' | 'onClick' | 'appearance'> & { to: To }) {
  const styles = useStyles();
  return <LinkButton {...props} to={to} appearance="primary" className={mergeClasses(styles.magma, className)} />;
}
