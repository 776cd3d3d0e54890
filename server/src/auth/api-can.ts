import { applyDecorators, HttpStatus } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import { CAN_ACTIONS, type CanKind } from '@mantlepiece/shared';

type Schema = Record<string, unknown>;

/** The `can` object of one kind in the OpenAPI document: every action of the kind, each a boolean. */
export function canSchema(kind: CanKind): Schema {
  const actions: readonly string[] = CAN_ACTIONS[kind];
  return {
    type: 'object',
    description: 'What the signed-in person may do, as the server decides it; the studio offers an action only when it is true.',
    required: [...actions],
    additionalProperties: false,
    properties: Object.fromEntries(actions.map((action) => [action, { type: 'boolean' }])),
  };
}

/** An object of `kind` as the API sends it; only its `can` (and nested `can`s) are spelled out. */
function viewSchema(kind: CanKind): Schema {
  const nested: Schema = kind === 'revision' ? { comments: { type: 'array', items: viewSchema('comment') } } : {};
  return { type: 'object', required: ['can'], properties: { can: canSchema(kind), ...nested } };
}

export type CanShape =
  /** One object (200, or 201 with `created`). */
  | { one: true; created?: boolean }
  /** An array of objects (201 with `created`). */
  | { array: true; created?: boolean }
  /** A page of objects, with the list's own `can` when it has one. */
  | { page: true; listCan?: CanKind }
  /** A page whose items carry none: the page's own `can` is of the kind. */
  | { pageOnly: true }
  /** A revision comparison: its base revision, if any. */
  | { comparison: true };

function schemaOf(kind: CanKind, shape: CanShape): Schema {
  if ('array' in shape) return { type: 'array', items: viewSchema(kind) };
  if ('pageOnly' in shape) return { type: 'object', required: ['items', 'can'], properties: { items: { type: 'array' }, total: { type: 'integer' }, page: { type: 'integer' }, pageSize: { type: 'integer' }, can: canSchema(kind) } };
  if ('comparison' in shape) return { type: 'object', properties: { base: { ...viewSchema(kind), nullable: true } } };
  if ('page' in shape) {
    const required = ['items', ...(shape.listCan ? ['can'] : [])];
    return {
      type: 'object',
      required,
      properties: { items: { type: 'array', items: viewSchema(kind) }, total: { type: 'integer' }, page: { type: 'integer' }, pageSize: { type: 'integer' }, ...(shape.listCan ? { can: canSchema(shape.listCan) } : {}) },
    };
  }
  return viewSchema(kind);
}

/** Documents that a route answers with objects of `kind`, each carrying `can`. */
export const ApiCan = (kind: CanKind, shape: CanShape = { one: true }) =>
  applyDecorators(ApiResponse({
    status: 'created' in shape && shape.created ? HttpStatus.CREATED : HttpStatus.OK,
    description: `Carries \`can\` (${kind}).`,
    schema: schemaOf(kind, shape),
  }));
