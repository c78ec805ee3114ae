import type { OpenAPIObject } from '@nestjs/swagger';
import { z } from 'zod';

/** An OpenAPI schema object as @nestjs/swagger's decorators take it (its own type is not exported). */
export type SchemaObject = Exclude<
  NonNullable<NonNullable<OpenAPIObject['components']>['schemas']>[string],
  { $ref: string }
>;

/**
 * A zod schema as an OpenAPI 3.0 schema object, from zod's own JSON Schema output. `input` describes
 * what a client sends (before defaults and transforms); `output` what the API answers.
 */
export function openApiSchema(schema: z.ZodType, io: 'input' | 'output' = 'input'): SchemaObject {
  // Refinements and transforms have no JSON Schema form; their input side is still described.
  const json = z.toJSONSchema(schema, { io, target: 'openapi-3.0', unrepresentable: 'any' }) as Record<string, unknown>;
  delete json.$schema;
  return json as SchemaObject;
}

/** The properties of an object schema (a query string's parameters), each with whether it is required. */
export function openApiProperties(schema: z.ZodType): { name: string; required: boolean; schema: SchemaObject }[] {
  const json = openApiSchema(schema) as { properties?: Record<string, SchemaObject>; required?: string[] };
  return Object.entries(json.properties ?? {}).map(([name, s]) => ({
    name,
    required: (json.required ?? []).includes(name),
    schema: s,
  }));
}
