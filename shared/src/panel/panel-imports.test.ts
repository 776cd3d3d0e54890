/// <reference types="node" />
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const here = new URL('.', import.meta.url).pathname;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory() ? sourceFiles(join(dir, entry.name)) : /\.ts$/.test(entry.name) && !entry.name.includes('.test.') ? [join(dir, entry.name)] : [],
  );
}

describe('the framework-free panel model', () => {
  it('imports nothing from React or the React subpath, so the server can load it', () => {
    const offenders = sourceFiles(here).filter((file) => /from '(react|react-dom|@tiptap\/react)[^']*'|from '\.\.\/react\//.test(readFileSync(file, 'utf8')));
    expect(offenders).toEqual([]);
  });
});
