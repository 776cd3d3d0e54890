import { createRequire } from 'node:module';

// The SPDX list as a JSON array, kept current by its package rather than by us.
const SPDX_LIST = createRequire(import.meta.url)('spdx-license-ids') as string[];

/** The SPDX identifiers a media licence may name (spdx.org/licenses, deprecated ones left out). */
export const SPDX_IDS: ReadonlySet<string> = new Set(SPDX_LIST);

/** The licences images in a museum are most often under, offered first; every other identifier follows. */
const COMMON_IMAGE_LICENCES = ['CC0-1.0', 'CC-BY-4.0', 'CC-BY-SA-4.0', 'CC-BY-NC-4.0', 'CC-BY-NC-SA-4.0', 'CC-BY-ND-4.0', 'CC-BY-NC-ND-4.0', 'CC-BY-3.0', 'CC-BY-SA-3.0', 'CC-PDDC'];

/** Every accepted identifier, the common image licences first and the rest in alphabetical order, for the studio's suggestions. */
export const LICENCE_IDS_IN_SUGGESTION_ORDER: readonly string[] = [
  ...COMMON_IMAGE_LICENCES.filter((id) => SPDX_IDS.has(id)),
  ...SPDX_LIST.filter((id) => !COMMON_IMAGE_LICENCES.includes(id)).sort((a, b) => a.localeCompare(b, 'en')),
];
