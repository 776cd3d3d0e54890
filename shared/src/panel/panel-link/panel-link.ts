import { Link } from '@tiptap/extension-link';
import { assertPanelHref, isPanelHref } from './panel-href.js';

/**
 * StarterKit's link, reduced to the one attribute a panel needs. Target, rel and class are decided
 * by whoever draws the panel (a kiosk must not open new windows), so a document cannot carry them.
 */
export const PanelLink = Link.extend({
  addAttributes() {
    return {
      href: {
        default: null,
        validate: assertPanelHref,
        parseHTML: (element: HTMLElement) => element.getAttribute('href'),
      },
    };
  },
}).configure({
  openOnClick: false,
  autolink: true,
  linkOnPaste: true,
  protocols: [],
  defaultProtocol: 'https',
  isAllowedUri: (url) => isPanelHref(url),
  HTMLAttributes: { target: '_blank', rel: 'noopener noreferrer nofollow', class: null },
});
