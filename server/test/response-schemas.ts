import path from 'node:path';
import { fileURLToPath } from 'node:url';
import * as TJS from 'typescript-json-schema';
import type { SchemaObject } from '@nestjs/swagger';

/*
 * Turns the TypeScript types of src/openapi/api-answers.ts into the OpenAPI 3.0 schemas the server
 * publishes (src/openapi/response-schemas.json), with typescript-json-schema reading the shared
 * package's sources, so the published schemas are the types the code compiles against.
 */

const serverDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const RESPONSE_SCHEMAS_FILE = path.join(serverDir, 'src/openapi/response-schemas.json');
const REGISTRY = 'ApiAnswerBodies';

type Json = Record<string, unknown>;

function jsonSchemaOfAnswers(): TJS.Definition {
  const program = TJS.getProgramFromFiles([path.join(serverDir, 'src/openapi/api-answers.ts')], {
    module: 'NodeNext',
    moduleResolution: 'NodeNext',
    target: 'ES2022',
    strict: true,
    skipLibCheck: true,
    experimentalDecorators: true,
    baseUrl: serverDir,
    paths: { '@mantlepiece/shared': ['../shared/src/index.ts'] },
  }, serverDir);
  const schema = TJS.generateSchema(program, REGISTRY, { required: true, noExtraProps: true, ref: true, topRef: true, strictNullChecks: true, ignoreErrors: true });
  if (!schema) throw new Error(`typescript-json-schema found no type ${REGISTRY}`);
  return schema;
}

/** `import("/…/views").Page<import("/…/views").StoryView>` → `Page<StoryView>`. */
const shortName = (name: string) => name.replace(/import\("[^"]*",\{with:\{[^}]*\}\}\)\./g, '');

/**
 * Component names: a type's own name; a generic with one named argument joins the two
 * (`WorkList_StoryWorkItem`); anything else (`Record<string, unknown>`) is written in place.
 */
function componentName(shortened: string): string | null {
  if (/^\w+$/.test(shortened)) return shortened;
  const generic = /^(\w+)<"?(\w+)"?>$/.exec(shortened);
  return generic ? `${generic[1]}_${generic[2]}` : null;
}

/** JSON Schema (draft 7, as the generator writes it) → the OpenAPI 3.0 dialect: `nullable`, no `const`, refs under components. */
function toOpenApi(schema: unknown, refName: (ref: string) => string | null, inline: (ref: string) => unknown): unknown {
  if (Array.isArray(schema)) return schema.map((item) => toOpenApi(item, refName, inline));
  if (!schema || typeof schema !== 'object') return schema;
  const source = schema as Json;
  if (typeof source.$ref === 'string') {
    const name = refName(source.$ref);
    return name ? { $ref: `#/components/schemas/${name}` } : toOpenApi(inline(source.$ref), refName, inline);
  }
  const out: Json = {};
  for (const [key, value] of Object.entries(source)) {
    if (key === '$schema' || key === 'definitions') continue;
    if (key === 'const') out.enum = [value];
    else if (key === 'properties') out.properties = Object.fromEntries(Object.entries(value as Json).map(([name, property]) => [name, toOpenApi(property, refName, inline)]));
    else out[key] = toOpenApi(value, refName, inline);
  }
  // typescript-json-schema closes every object, even Record<string, unknown>, which has no properties to close over.
  if (out.type === 'object' && !out.properties && out.additionalProperties === false) delete out.additionalProperties;
  if (Array.isArray(out.type)) {
    const types = (out.type as string[]).filter((type) => type !== 'null');
    if (types.length < (out.type as string[]).length) out.nullable = true;
    if (types.length === 1) out.type = types[0];
    else {
      delete out.type;
      out.anyOf = types.map((type) => ({ type }));
    }
  }
  if (Array.isArray(out.enum) && out.enum.includes(null)) {
    out.enum = out.enum.filter((value) => value !== null);
    out.nullable = true;
  }
  for (const combiner of ['anyOf', 'oneOf'] as const) {
    const options = out[combiner] as Json[] | undefined;
    if (!options?.some((option) => option.type === 'null' && Object.keys(option).length === 1)) continue;
    const rest = options.filter((option) => !(option.type === 'null' && Object.keys(option).length === 1));
    delete out[combiner];
    // OpenAPI 3.0 ignores siblings of $ref, so a nullable reference is an allOf of one.
    const [only] = rest;
    if (rest.length === 1 && only && !only.$ref) Object.assign(out, only);
    else if (rest.length === 1) out.allOf = rest;
    else out[combiner] = rest;
    out.nullable = true;
  }
  return out;
}

/**
 * typescript-json-schema writes `Record<string, V>` as an object of nothing, dropping V; an index
 * signature (`{ [locale: string]: V }`) keeps it. Only `Record<string, unknown>` loses nothing.
 */
function refuseRecordsOfValues(definitions: Record<string, Json>): void {
  const lossy = Object.keys(definitions).map(shortName).filter((name) => /\bRecord<string,(?!unknown>)/.test(name));
  if (lossy.length) throw new Error(`Answer types use Record<string, V>, whose V the schema would lose; write { [key: string]: V } instead: ${lossy.join(', ')}`);
}

/** The schemas of every answer body, keyed by component name, in a stable order. */
export function generateResponseSchemas(): Record<string, SchemaObject> {
  const schema = jsonSchemaOfAnswers();
  const definitions = (schema.definitions ?? {}) as Record<string, Json>;
  refuseRecordsOfValues(definitions);
  const registry = definitions[Object.keys(definitions).find((name) => shortName(name) === REGISTRY)!]!;
  const decode = (ref: string) => decodeURIComponent(ref.replace('#/definitions/', ''));
  const names = new Map<string, string | null>(Object.keys(definitions).map((name) => [name, componentName(shortName(name))]));
  // A generic that an answer names directly takes the answer's name (Page<StoryView> → its answer's name).
  const answers = Object.entries(registry.properties as Record<string, Json>);
  for (const [answer, property] of answers) {
    if (typeof property.$ref !== 'string') continue;
    const definition = decode(property.$ref);
    if (shortName(definition).includes('<') || names.get(definition) === null) names.set(definition, answer);
  }
  const refName = (ref: string) => names.get(decode(ref)) ?? null;
  const inline = (ref: string) => definitions[decode(ref)];
  const components: Record<string, SchemaObject> = {};
  for (const [definition, name] of names) {
    if (name && name !== REGISTRY) components[name] = toOpenApi(definitions[definition], refName, inline) as SchemaObject;
  }
  for (const [answer, property] of answers) {
    if (!components[answer]) components[answer] = toOpenApi(property, refName, inline) as SchemaObject;
  }
  return Object.fromEntries(Object.keys(components).sort().map((name) => [name, components[name]!]));
}
