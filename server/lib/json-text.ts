import { promisify } from 'node:util';
import { gzip as gzipCallback } from 'node:zlib';

const gzip = promisify(gzipCallback);

/** Below this a gzip header and a dictionary cost more than they save. */
const WORTH_COMPRESSING = 1024;

/**
 * A response body serialised once, as UTF-8 bytes and (when large enough) gzip-compressed, with the entity
 * tag that names its content. Cached answers are sent as these bytes, so a hit costs no JSON, no text
 * encoding and no compression. Compressing runs on libuv's thread pool, off the request thread.
 */
export class JsonText {
  private constructor(
    readonly body: Buffer,
    readonly gzipped: Buffer | null,
    readonly etag: string,
  ) {}

  static async of(value: unknown, etag: string): Promise<JsonText> {
    const body = Buffer.from(JSON.stringify(value), 'utf8');
    return new JsonText(body, body.length >= WORTH_COMPRESSING ? await gzip(body) : null, etag);
  }

  /** Bytes held, for the cache's budget. */
  get size(): number {
    return this.body.length + (this.gzipped?.length ?? 0);
  }
}
