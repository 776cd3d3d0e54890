import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { documentedTable, roleMatrixTable, withTable } from './role-matrix-doc.js';

const developersGuide = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../DEVELOPERS.md');

describe('the role matrix in DEVELOPERS.md', () => {
  it('is the matrix the role-matrix suite enforces (UPDATE_ROLE_MATRIX_DOC=1 rewrites it)', () => {
    const markdown = fs.readFileSync(developersGuide, 'utf8');
    if (process.env.UPDATE_ROLE_MATRIX_DOC) fs.writeFileSync(developersGuide, withTable(markdown, roleMatrixTable()));
    const documented = documentedTable(fs.readFileSync(developersGuide, 'utf8'));
    expect(documented, 'DEVELOPERS.md needs the role-matrix markers').not.toBeNull();
    expect(documented, 'DEVELOPERS.md is out of date: run `cd test && UPDATE_ROLE_MATRIX_DOC=1 npx vitest run docs`').toBe(roleMatrixTable());
  });
});
