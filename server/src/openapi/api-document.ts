import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject, type SchemaObject } from '@nestjs/swagger';
import responseSchemas from './response-schemas.json' with { type: 'json' };

export type ResponseSchemas = Record<string, SchemaObject>;

/** The one body every error answer carries (see ApiExceptionFilter). */
const ERROR_RESPONSE = 'ApiError';
const ERROR_STATUSES = ['4XX', '5XX'] as const;

/**
 * The OpenAPI document of the running app: Nest's scan of the routes and DTOs, the answer bodies'
 * schemas (generated from their TypeScript types, `npm run api:types`), and the common error
 * body on every operation.
 */
export function buildApiDocument(app: INestApplication, schemas: ResponseSchemas = responseSchemas as unknown as ResponseSchemas): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Mantlepiece API')
    .setDescription('Stories for earth-science gallery touchscreens: studio, kiosks and their server.')
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  const components = document.components ?? {};
  document.components = {
    ...components,
    schemas: { ...components.schemas, ...schemas },
    responses: {
      ...components.responses,
      [ERROR_RESPONSE]: {
        description: 'Refused or failed: the status says why, `message` in words, `errors` field by field.',
        content: { 'application/json': { schema: { $ref: '#/components/schemas/ApiErrorBody' } } },
      },
    },
  };
  for (const operations of Object.values(document.paths)) {
    for (const operation of Object.values(operations)) {
      if (!operation || typeof operation !== 'object' || !('responses' in operation)) continue;
      const { responses } = operation as { responses: Record<string, unknown> };
      for (const status of ERROR_STATUSES) responses[status] ??= { $ref: `#/components/responses/${ERROR_RESPONSE}` };
    }
  }
  return document;
}
