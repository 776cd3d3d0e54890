import { readFile } from 'node:fs/promises';
import sharp from 'sharp';

/**
 * The demo's pictures: SVG sources kept with their credits in the checkout's `media/demo/` (see
 * `media/README.md`), rasterised to PNG at seed time as a curator's upload would arrive. The path is
 * the same from `src/seed/` and `dist/seed/`.
 */
const SOURCES = new URL('../../../media/demo/', import.meta.url);

export const DEMO_IMAGES = { mantleOverturn: 'mantle-overturn.svg', spreadingRidge: 'spreading-ridge.svg', sinkingSlab: 'sinking-slab.svg' } as const;
export type DemoImageName = keyof typeof DEMO_IMAGES;

export const renderDemoImage = async (name: DemoImageName): Promise<Buffer> =>
  sharp(await readFile(new URL(DEMO_IMAGES[name], SOURCES))).png().toBuffer();
