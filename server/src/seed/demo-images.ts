import sharp from 'sharp';

/**
 * The demo's pictures, drawn here as SVG and rasterised to PNG at seed time: the project makes
 * them itself, so their rights are ours to state. Colours follow the studio's palette: sea-floor
 * blues, basalt greys, magma orange, sediment sand.
 */
const W = 1600;
const H = 1000;

const frame = (body: string) =>
  `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">${body}</svg>`;

const arrowHead = `<defs><marker id="head" viewBox="0 0 10 10" refX="8" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse"><path d="M0,0 L10,5 L0,10 z" fill="#1d2a33"/></marker></defs>`;

/** Two convection cells: hot rock rising in the middle, cool rock sinking at the sides. */
const mantleOverturn = frame(`${arrowHead}
  <defs><linearGradient id="heat" x1="0" y1="1" x2="0" y2="0"><stop offset="0" stop-color="#d9531e"/><stop offset="0.55" stop-color="#e9a56b"/><stop offset="1" stop-color="#3f6f8f"/></linearGradient></defs>
  <rect width="${W}" height="${H}" fill="#f3e7d3"/>
  <rect x="100" y="180" width="1400" height="720" rx="24" fill="url(#heat)"/>
  <rect x="100" y="120" width="1400" height="60" fill="#4a4f55"/>
  <g fill="none" stroke="#1d2a33" stroke-width="14" marker-end="url(#head)">
    <path d="M800 820 C 800 520, 800 330, 700 300 C 420 250, 260 300, 240 520 C 230 700, 420 800, 700 820"/>
    <path d="M800 820 C 800 520, 800 330, 900 300 C 1180 250, 1340 300, 1360 520 C 1370 700, 1180 800, 900 820"/>
  </g>
  <rect x="100" y="900" width="1400" height="40" fill="#b3361a"/>`);

/** A mid-ocean ridge: new sea floor at the crest, sloping down and away on both sides. */
const spreadingRidge = frame(`${arrowHead}
  <rect width="${W}" height="${H}" fill="#cfe3ee"/>
  <rect y="0" width="${W}" height="380" fill="#7fb2cc"/>
  <path d="M0 760 L 560 560 Q 800 470 1040 560 L 1600 760 L 1600 1000 L 0 1000 z" fill="#4a4f55"/>
  <path d="M0 860 L 560 660 Q 800 570 1040 660 L 1600 860 L 1600 1000 L 0 1000 z" fill="#6b7178"/>
  <path d="M760 1000 L 780 600 Q 800 540 820 600 L 840 1000 z" fill="#d9531e"/>
  <g stroke="#1d2a33" stroke-width="14" marker-end="url(#head)"><line x1="660" y1="470" x2="360" y2="580"/><line x1="940" y1="470" x2="1240" y2="580"/></g>
  <rect x="1180" y="590" width="110" height="80" fill="#e9c98f" stroke="#1d2a33" stroke-width="6" transform="rotate(20 1235 630)"/>`);

/** A cold, heavy plate bending down at a trench and sinking into the mantle. */
const sinkingSlab = frame(`${arrowHead}
  <rect width="${W}" height="${H}" fill="#f3e7d3"/>
  <rect y="0" width="${W}" height="260" fill="#7fb2cc"/>
  <rect y="260" width="${W}" height="740" fill="#e9a56b"/>
  <path d="M0 260 L 900 260 Q 1020 270 1080 340 L 1380 900 L 1280 950 L 990 410 Q 950 350 880 340 L 0 340 z" fill="#3f6f8f"/>
  <path d="M1100 260 L 1600 260 L 1600 340 L 1160 340 z" fill="#4a4f55"/>
  <g stroke="#1d2a33" stroke-width="14" marker-end="url(#head)"><line x1="200" y1="200" x2="600" y2="200"/><line x1="1180" y1="560" x2="1300" y2="790"/></g>`);

export const DEMO_IMAGES = { mantleOverturn, spreadingRidge, sinkingSlab } as const;
export type DemoImageName = keyof typeof DEMO_IMAGES;

export const renderDemoImage = (name: DemoImageName): Promise<Buffer> => sharp(Buffer.from(DEMO_IMAGES[name])).png().toBuffer();
