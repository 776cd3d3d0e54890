/**
 * Panel colours: sediment-sand surface, basalt text, sea-floor-blue headings and links, and a
 * high-contrast pair. Text pairs stay well above WCAG 2.2 AA's 4.5:1 (basalt on sand is about 12:1).
 * Here, apart from the React drawing, because preflight checks them too.
 */
export const PANEL_COLOURS = {
  standard: { surface: '#f4ebdd', text: '#24282c', heading: '#0b3f5c', link: '#0a5479', liveValue: '#8a3412', control: '#0b3f5c', controlText: '#ffffff', controlBorder: '#0b3f5c' },
  highContrast: { surface: '#000000', text: '#ffffff', heading: '#ffffff', link: '#ffe16b', liveValue: '#ffe16b', control: '#ffe16b', controlText: '#000000', controlBorder: '#ffffff' },
} as const;
