// The parts of an OpenAPI 3.1 document the reference page reads (the server's document has more).

/** A JSON Schema (draft 2020-12) as zod writes it. */
export interface JsonSchema {
  type?: string | string[];
  description?: string;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  enum?: unknown[];
  const?: unknown;
  default?: unknown;
  oneOf?: JsonSchema[];
  anyOf?: JsonSchema[];
  allOf?: JsonSchema[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  format?: string;
  prefixItems?: JsonSchema[];
  contentMediaType?: string;
}

export type AuthNeed = 'visitor' | 'session' | 'session-or-token';

export interface Parameter {
  name?: string;
  in?: 'path' | 'query' | 'header';
  required?: boolean;
  description?: string;
  schema?: JsonSchema;
  $ref?: string;
}

export interface Operation {
  operationId: string;
  summary: string;
  description?: string;
  tags: string[];
  'x-scanwright-auth': AuthNeed;
  security: Array<Record<string, string[]>>;
  parameters?: Parameter[];
  requestBody?: { content: Record<string, { schema: JsonSchema; example?: unknown }> };
  responses: Record<string, { description?: string; $ref?: string }>;
}

export interface OpenApiDoc {
  openapi: string;
  info: { title: string; version: string; summary?: string; description?: string };
  servers?: Array<{ url: string }>;
  tags: Array<{ name: string; description: string }>;
  paths: Record<string, Record<string, Operation>>;
  components: { parameters: Record<string, Parameter> };
}

export const HTTP_METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;
