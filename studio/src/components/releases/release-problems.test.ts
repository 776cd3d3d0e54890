import { describe, expect, it } from 'vitest';
import { groupReleaseProblems } from './release-problems';

describe('a refused release request as readable sections', () => {
  it('sorts the server’s problems into revisions, translations, image rights and other preflight blockers', () => {
    const sections = groupReleaseProblems([
      { path: ['preflight', 'word-budget', 4, 17], message: '“Why plates slide”: panel 2 is over its word budget.' },
      { path: ['locales', 'fr', 4], message: '“Why plates slide” in fr: 3 untranslated of 12 texts.' },
      { path: ['preflight', 'image-licence-expiry', 5], message: '“Hot rock rises”: the licence of ridge.webp has expired.' },
      { path: ['revisionIds', 0], message: 'Revision 9 is not approved.' },
      { path: ['locales', 'es', 4], message: '“Why plates slide” in es: 1 stale of 12 texts.' },
    ]);
    expect(sections).toEqual([
      { group: 'revisions', messages: ['Revision 9 is not approved.'] },
      { group: 'translations', messages: ['“Why plates slide” in fr: 3 untranslated of 12 texts.', '“Why plates slide” in es: 1 stale of 12 texts.'] },
      { group: 'rights', messages: ['“Hot rock rises”: the licence of ridge.webp has expired.'] },
      { group: 'preflight', messages: ['“Why plates slide”: panel 2 is over its word budget.'] },
    ]);
  });

  it('leaves out the sections with nothing in them', () => {
    expect(groupReleaseProblems([{ path: ['revisionIds'], message: 'Approve at least one story of the gallery’s exhibits first.' }]).map((s) => s.group)).toEqual(['revisions']);
  });
});
