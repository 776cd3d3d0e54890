import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { OpenAPIObject, OperationObject, ReferenceObject, ResponseObject } from '@nestjs/swagger';
import openapiTS, { astToString, COMMENT_HEADER } from 'openapi-typescript';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildApiDocument } from '../src/openapi/api-document.js';
import { generateResponseSchemas, RESPONSE_SCHEMAS_FILE } from './response-schemas.js';
import { createTestApp, type TestApp } from './test-app.js';

/*
 * The contract the studio and kiosk are built on: every operation says what it answers, and the
 * committed generated files (the answer schemas, and the TypeScript types of the whole document
 * that both apps import) are what the code makes today. `npm run api:types` writes them again.
 */

const REGENERATE = 'npm run api:types';
const updating = process.env.UPDATE_API_TYPES === '1';
const API_TYPES_FILE = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../shared/src/api/openapi.ts');
const METHODS = ['get', 'put', 'post', 'delete', 'patch'] as const;

let t: TestApp;
let document: OpenAPIObject;
let schemas: ReturnType<typeof generateResponseSchemas>;

beforeAll(async () => {
  t = await createTestApp();
  // Generated afresh, so one run of `npm run api:types` brings both files up to date together.
  schemas = generateResponseSchemas();
  document = buildApiDocument(t.app, schemas);
}, 180_000);
afterAll(() => t?.close());

/** Compares a generated file with the committed one, or writes it when regenerating. */
function expectCommitted(file: string, generated: string): void {
  if (updating) fs.writeFileSync(file, generated);
  const committed = fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : '';
  expect(committed === generated, `${path.relative(process.cwd(), file)} is not what the code generates today; run \`${REGENERATE}\` and commit the result`).toBe(true);
}

const operations = () => Object.entries(document.paths).flatMap(([route, item]) =>
  METHODS.flatMap((method) => (item[method] ? [{ label: `${method.toUpperCase()} ${route}`, operation: item[method] as OperationObject }] : [])));

const isRef = (value: unknown): value is ReferenceObject => typeof value === 'object' && value !== null && '$ref' in value;

describe('the OpenAPI document', () => {
  it('declares, for every operation, what it answers on success: a body with its schema, or none on purpose', () => {
    const undeclared = operations().flatMap(({ label, operation }) => {
      const successes = Object.entries(operation.responses).filter(([status]) => /^[23]\d\d$/.test(status));
      if (successes.length === 0) return [`${label}: no success answer`];
      return successes.flatMap(([status, response]) => {
        const { description, content } = response as ResponseObject;
        // Nest's own placeholder for a route nobody described has an empty description and no body.
        if (!content) return description ? [] : [`${label} ${status}: neither a body nor a reason for none`];
        return Object.entries(content).filter(([, media]) => !media.schema).map(([type]) => `${label} ${status} ${type}: no schema`);
      });
    });
    expect(undeclared).toEqual([]);
    expect(operations().length).toBeGreaterThan(90);
  });

  it('declares the common error body (ApiErrorBody) for every 4xx and 5xx of every operation', () => {
    const errorBody = document.components?.responses?.ApiError as ResponseObject;
    expect(errorBody.content?.['application/json']?.schema).toEqual({ $ref: '#/components/schemas/ApiErrorBody' });
    expect(schemas.ApiErrorBody?.required).toEqual(['message', 'statusCode']);
    const missing = operations().flatMap(({ label, operation }) =>
      ['4XX', '5XX'].filter((status) => !operation.responses[status]).map((status) => `${label} ${status}`));
    expect(missing).toEqual([]);
  });

  it('resolves every reference it makes', () => {
    const refs = new Set<string>();
    const collect = (value: unknown): void => {
      if (Array.isArray(value)) value.forEach(collect);
      else if (value && typeof value === 'object') {
        if (isRef(value)) refs.add(value.$ref);
        Object.values(value).forEach(collect);
      }
    };
    collect(document);
    const unresolved = [...refs].filter((ref) => {
      const [, , kind, name] = ref.split('/');
      return !(document.components as Record<string, Record<string, unknown> | undefined>)[kind!]?.[name!];
    });
    expect(unresolved).toEqual([]);
  });

  it('keeps the answer schemas and the request DTOs apart: no answer body takes a DTO’s name', () => {
    const nestSchemas = buildApiDocument(t.app, {}).components?.schemas ?? {};
    expect(Object.keys(schemas).filter((name) => name in nestSchemas)).toEqual([]);
  });
});

describe('the generated files', () => {
  it('src/openapi/response-schemas.json holds the schemas of the answer types as they are', () => {
    expectCommitted(RESPONSE_SCHEMAS_FILE, `${JSON.stringify(schemas, null, 2)}\n`);
  });

  it('shared/src/api/openapi.ts holds the TypeScript types of the document as the app builds it', async () => {
    // A default is what the server fills in when a request leaves a field out, so it stays optional in the types.
    const types = astToString(await openapiTS(JSON.parse(JSON.stringify(document)), { defaultNonNullable: false, emptyObjectsUnknown: true }));
    expectCommitted(API_TYPES_FILE, `${COMMENT_HEADER}// Generated from the server's OpenAPI document by \`${REGENERATE}\`; do not edit.\n\n${types}`);
  }, 60_000);
});
