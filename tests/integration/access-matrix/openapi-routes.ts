import type { TestApp } from '../../setup/test-app';
import { anonymousAgent } from '../../setup/test-app';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface DocumentedRoute {
  method: Method;
  /** OpenAPI form, e.g. `/api/clients/{id}`. */
  path: string;
  /** `METHOD /path` as the access table keys it, e.g. `GET /api/clients/{id}`. */
  key: string;
  operation: OpenApiOperation;
}

export interface OpenApiOperation {
  parameters?: { name: string; in: 'path' | 'query'; required?: boolean; schema: Record<string, unknown> }[];
  requestBody?: { content: Record<string, { schema: Record<string, unknown> }> };
  responses?: Record<string, { content?: Record<string, unknown> }>;
}

/** Every operation in the app's own OpenAPI document: the list the security suites walk. */
export async function documentedRoutes(
  app: TestApp['app'],
): Promise<{ routes: DocumentedRoute[]; document: { components?: { schemas?: Record<string, unknown> } } }> {
  const document = (await (await anonymousAgent(app)).get('/api/openapi.json')).body;
  const routes = Object.entries(document.paths as Record<string, Record<string, OpenApiOperation>>).flatMap(([path, ops]) =>
    Object.entries(ops).map(([method, operation]) => ({ method: method as Method, path, key: `${method.toUpperCase()} ${path}`, operation })),
  );
  return { routes, document };
}

/** The path with each `{param}` replaced from `values` (a placeholder id when missing). */
export function fillPath(path: string, values: Record<string, string> = {}): string {
  return path.replace(/\{(\w+)\}/g, (_m, name: string) => encodeURIComponent(values[name] ?? '00000000-0000-4000-8000-000000000000'));
}
