import { describe, expect, it } from 'vitest';
import { licenceSuggestions } from './licence';

// Identifiers from the SPDX License List (spdx.org/licenses), in the order the server sends them: common image licences first.
const ids = ['CC0-1.0', 'CC-BY-4.0', 'CC-BY-SA-4.0', '0BSD', 'FSL-1.1-MIT', 'MIT', 'MIT-0', 'X11'];

describe('licence suggestions', () => {
  it('offers identifiers that start with the typed text before those that only contain it', () => {
    expect(licenceSuggestions(ids, 'mit', 12)).toEqual(['MIT', 'MIT-0', 'FSL-1.1-MIT']);
  });

  it('keeps the server’s order within each part and stops at the limit', () => {
    expect(licenceSuggestions(ids, 'CC', 2)).toEqual(['CC0-1.0', 'CC-BY-4.0']);
    expect(licenceSuggestions(ids, '', 3)).toEqual(['CC0-1.0', 'CC-BY-4.0', 'CC-BY-SA-4.0']);
  });
});
