/// <reference types="node" />
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const shared = new URL('..', import.meta.url).pathname;

/** Every module specifier a rule file imports, with the file it is in. */
function importsOf(folder: string): { file: string; from: string }[] {
  return readdirSync(join(shared, folder))
    .filter((name) => name.endsWith('.ts') && !name.includes('.test.'))
    .flatMap((name) => [...readFileSync(join(shared, folder, name), 'utf8').matchAll(/from '([^']+)'/g)].map((match) => ({ file: `${folder}/${name}`, from: match[1]! })));
}

// Common practice, no source: a rule that reads a module's inner files breaks when that module is rearranged.
describe('preflight and translation rules', () => {
  const imports = [...importsOf('preflight'), ...importsOf('translation')];

  it('import nothing from the React folder', () => {
    expect(imports.filter(({ from }) => /(^|\/)react(\/|$)|^react/.test(from))).toEqual([]);
  });

  it('reach widgets through the registry and the live value and live phrase through their modules\' index, never their inner files', () => {
    const inner = imports.filter(({ from }) => /\/widgets\/[^/]+\//.test(from) || /\/panel\/live-(value|phrase)\/(?!index\.js$)/.test(from));
    expect(inner).toEqual([]);
  });
});
