import { useFluent } from '@fluentui/react-components';
import { ArrowLeftRegular, ArrowRightRegular } from '@fluentui/react-icons';

/**
 * Arrows for earlier and later in reading order. Fluent's plain arrow icons keep their direction in
 * a right-to-left layout, so an Arabic "previous" would point the wrong way without this.
 */
export function BackArrow() {
  return useFluent().dir === 'rtl' ? <ArrowRightRegular /> : <ArrowLeftRegular />;
}

export function ForwardArrow() {
  return useFluent().dir === 'rtl' ? <ArrowLeftRegular /> : <ArrowRightRegular />;
}
