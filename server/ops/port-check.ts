import { createServer } from 'node:net';

/** Resolves when host:port can be bound now; rejects with a message naming the port otherwise. */
export function assertPortFree(port: number, host = '127.0.0.1'): Promise<void> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', () => reject(new Error(`Port ${port} on ${host} is already in use. Stop what uses it or set PORT to another port.`)));
    probe.listen(port, host, () => probe.close(() => resolve()));
  });
}
