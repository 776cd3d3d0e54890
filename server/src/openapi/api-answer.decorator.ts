import { HttpStatus } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import type { ApiAnswerBodies, ApiAnswerName } from './api-answers.js';

type Content = Record<string, { schema: Record<string, unknown> }>;

/** A route's method, whatever it takes, returning `T` now or later. */
type Answering<T> = (...args: never[]) => T | Promise<T>;

const bodyOf = (name: ApiAnswerName) => ({ schema: { $ref: `#/components/schemas/${name}` } });

const TEXT_ANSWERS = { 'text/csv': 'The same rows as CSV, when the request accepts text/csv.' } as const;

export interface AnswerOptions {
  status?: HttpStatus;
  description?: string;
  /** The same answer as text in another media type, chosen by the request's Accept header. */
  alsoAs?: keyof typeof TEXT_ANSWERS;
}

function answer(name: ApiAnswerName, { status = HttpStatus.OK, description, alsoAs }: AnswerOptions): MethodDecorator {
  const content: Content = { 'application/json': bodyOf(name) };
  if (alsoAs) content[alsoAs] = { schema: { type: 'string', description: TEXT_ANSWERS[alsoAs] } };
  return ApiResponse({ status, description: description ?? name, content });
}

/**
 * Documents a route's JSON answer by the name of its body in `ApiAnswerBodies`; the compiler holds
 * the route's method to returning that type, so the published schema is what the route sends.
 */
export function ApiAnswer<K extends ApiAnswerName, O extends AnswerOptions = AnswerOptions>(name: K, options?: O) {
  // A route that also answers as text returns that text as a string.
  type Body = ApiAnswerBodies[K] | (O extends { alsoAs: string } ? string : never);
  return <M extends Answering<Body>>(target: object, key: string | symbol, descriptor: TypedPropertyDescriptor<M>): void => {
    answer(name, options ?? {})(target, key, descriptor);
  };
}

/**
 * The same, for a route that writes its answer through Express's response itself (it answers
 * more than one way: a body, or an empty 204 or 304), so its method returns nothing to check.
 */
export const ApiAnswerSent = (name: ApiAnswerName, options: AnswerOptions = {}): MethodDecorator => answer(name, options);

/** An answer without a body: 204 after a change, or another status named with what it means. */
export const ApiNoBody = (status: HttpStatus = HttpStatus.NO_CONTENT, description = 'No body.'): MethodDecorator =>
  ApiResponse({ status, description });

/** A file of one media type: text (`binary: false`) or bytes. */
export const ApiFileAnswer = (mediaType: string, description: string, { binary = true, status = HttpStatus.OK }: { binary?: boolean; status?: HttpStatus } = {}): MethodDecorator =>
  ApiResponse({ status, description, content: { [mediaType]: { schema: binary ? { type: 'string', format: 'binary' } : { type: 'string' } } } });
