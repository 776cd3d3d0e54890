import { createLightTheme, type BrandVariants, type Theme } from '@fluentui/react-components';
import '@fontsource/lexend/400.css';
import '@fontsource/lexend/500.css';
import '@fontsource/lexend/600.css';
import '@fontsource/lexend/700.css';

/** Sea-floor blues, from the abyssal plain (10) to sunlit shallows (160). */
export const seaFloor: BrandVariants = {
  10: '#030b14',
  20: '#071a2b',
  30: '#0a2740',
  40: '#0c3353',
  50: '#0e3f66',
  60: '#114b78',
  70: '#15588a',
  80: '#1a659b',
  90: '#2a74a8',
  100: '#3f84b4',
  110: '#5694c0',
  120: '#6fa5cb',
  130: '#89b7d6',
  140: '#a5c9e1',
  150: '#c2dbeb',
  160: '#e0eef6',
};

/** Basalt greys for text and strokes: cool, nearly black, never pure grey. */
export const basalt = {
  text: '#1f2326',
  textSecondary: '#3a4046',
  textTertiary: '#555c63',
  textQuaternary: '#646b72',
  strokeAccessible: '#5c636a',
  stroke: '#d6cdbd',
  strokeSubtle: '#e4dccd',
} as const;

/** Warm sediment-sand surfaces, lightest first. */
export const sediment = {
  surface: '#fffdf9',
  surfaceHover: '#f8f2e8',
  surfacePressed: '#efe7d8',
  raised: '#faf6ee',
  canvas: '#f4eee2',
  sunken: '#efe7d8',
} as const;

/** Magma orange: highlights and the one call to action of a screen. */
export const magma = {
  background: '#b83c0a',
  backgroundHover: '#9f3308',
  backgroundPressed: '#862b06',
  foregroundOnMagma: '#ffffff',
  foreground: '#a13508',
  glow: '#ffb68a',
  tint: '#fbe3d4',
} as const;

/** The header band: deep water with sand-coloured text. */
export const header = {
  background: seaFloor[40],
  foreground: sediment.canvas,
  highlight: magma.glow,
} as const;

const fontFamily = "'Lexend', 'Segoe UI', system-ui, -apple-system, sans-serif";

export const mantlepieceTheme: Theme = {
  ...createLightTheme(seaFloor),
  fontFamilyBase: fontFamily,
  colorNeutralForeground1: basalt.text,
  colorNeutralForeground1Hover: basalt.text,
  colorNeutralForeground1Pressed: basalt.text,
  colorNeutralForeground1Selected: basalt.text,
  colorNeutralForeground2: basalt.textSecondary,
  colorNeutralForeground2Hover: basalt.text,
  colorNeutralForeground2Pressed: basalt.text,
  colorNeutralForeground2Selected: basalt.text,
  colorNeutralForeground3: basalt.textTertiary,
  colorNeutralForeground4: basalt.textQuaternary,
  colorNeutralStrokeAccessible: basalt.strokeAccessible,
  colorNeutralStroke1: basalt.stroke,
  colorNeutralStroke2: basalt.strokeSubtle,
  colorNeutralBackground1: sediment.surface,
  colorNeutralBackground1Hover: sediment.surfaceHover,
  colorNeutralBackground1Pressed: sediment.surfacePressed,
  colorNeutralBackground1Selected: sediment.surfacePressed,
  colorNeutralBackground2: sediment.raised,
  colorNeutralBackground3: sediment.canvas,
  colorNeutralBackground4: sediment.sunken,
  colorSubtleBackgroundHover: sediment.surfaceHover,
  colorSubtleBackgroundPressed: sediment.surfacePressed,
  colorSubtleBackgroundSelected: sediment.surfacePressed,
};
