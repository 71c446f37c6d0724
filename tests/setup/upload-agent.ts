import type { Agent } from './test-app';

export interface UploadFile {
  name: string;
  bytes: Buffer;
  /** What the browser claims; the server must ignore it and read the bytes. */
  contentType?: string;
}

/**
 * Multipart writes through a signed-in agent. Each call fetches a fresh CSRF token, as a page would;
 * callers that go on using the agent's `write` must call its `refreshCsrf()` first.
 */
export async function upload(agent: Agent, path: string, files: UploadFile[], fields: Record<string, string> = { kind: 'hair_now' }) {
  const token = (await agent.get('/api/csrf')).body.token as string;
  let req = agent.post(path).set('X-CSRF-Token', token);
  for (const [key, value] of Object.entries(fields)) req = req.field(key, value);
  for (const f of files) req = req.attach('photos', f.bytes, { filename: f.name, contentType: f.contentType ?? 'image/jpeg' });
  return req;
}

export async function remove(agent: Agent, path: string) {
  const token = (await agent.get('/api/csrf')).body.token as string;
  return agent.delete(path).set('X-CSRF-Token', token);
}
