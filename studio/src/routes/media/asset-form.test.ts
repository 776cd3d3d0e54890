import { describe, expect, it } from 'vitest';
import type { MediaView } from '@mantlepiece/shared';
import { i18next } from '../../app/i18n';
import { assetChanges, assetProblems, assetValues } from './asset-form';

const asset = {
  id: 7, credit: 'Drawing: Basalt Point', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: null, alt: { en: 'A tilted slab', fr: '' },
} as unknown as MediaView;

describe('the media asset form', () => {
  it('sends what the curator set, dropping empty alt texts and blank credit', () => {
    const values = { ...assetValues(asset), credit: '  ', alt: { en: ' A tilted slab ', fr: '' } };
    expect(assetChanges(values)).toEqual({ credit: null, licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: null, alt: { en: 'A tilted slab' } });
  });

  it('sends all rights reserved with its holder', () => {
    const values = { ...assetValues(asset), licenceKind: 'all-rights-reserved' as const, holder: 'Tomás Reyes' };
    expect(assetChanges(values).licence).toEqual({ kind: 'all-rights-reserved', holder: 'Tomás Reyes' });
  });

  it('asks for a holder when all rights are reserved, and refuses an SPDX identifier with spaces', () => {
    const t = i18next.getFixedT('en');
    expect(assetProblems(t, { ...assetValues(asset), licenceKind: 'all-rights-reserved', holder: '' }).holder).toBe('Required');
    expect(assetProblems(t, { ...assetValues(asset), spdxId: 'CC BY 4.0' }).spdxId).toBeDefined();
  });
});
