import { assertPanelId } from './widget/widget-id.js';

/** A node attribute holding a panel id (a widget's, a live phrase's), kept in the HTML as `dataAttribute`. */
export function panelIdAttribute(name: string, dataAttribute: string) {
  return {
    default: null,
    validate: assertPanelId,
    parseHTML: (element: HTMLElement) => element.getAttribute(dataAttribute),
    renderHTML: (attributes: Record<string, unknown>) => ({ [dataAttribute]: attributes[name] }),
  };
}

/** A node attribute's JSON read back from pasted HTML: null when it is missing, not JSON, or not of its shape. */
export function jsonFromHTML<T>(element: HTMLElement, dataAttribute: string, isShaped: (value: unknown) => value is T): T | null {
  try {
    const parsed: unknown = JSON.parse(element.getAttribute(dataAttribute) ?? '');
    return isShaped(parsed) ? parsed : null;
  } catch {
    return null;
  }
}
