import type { Request, RequestHandler, Response } from 'express';
import multer from 'multer';
import { z, type ZodObject, type ZodType } from 'zod';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { ApiErrorBodySchema } from '@shared/api/error.schemas';
import { describeAccess, openApiPath, type Endpoint, type Parsed, type UploadLimits } from '@shared/api/endpoint';
import { requireAccess } from '../auth/require-access';
import { errorStatuses, type RouteTable } from './api-route';
import { AppError } from './app-error';
import { safeFileName } from './safe-file-name';
import { assertStorable } from './unstorable-text';

// Only these routes read multipart; express.json keeps its 100 kB limit everywhere else.

/** An upload endpoint: multipart body whose text fields are `body`, with its file limits. */
export type UploadEndpoint = Endpoint & { body: ZodObject; upload: UploadLimits; response: ZodType };

export interface UploadContext<F, P> {
  fields: F;
  params: P;
  files: Express.Multer.File[];
  user: SessionUser;
  req: Request;
  res: Response;
}

/**
 * The multipart sibling of apiRoute: the same access check, zod parsing of the text fields and path
 * params, and an OpenAPI entry, plus multer in memory for the files. `before` runs after the access
 * check and before any byte is read (a rate limit).
 */
export function uploadRoute<const E extends UploadEndpoint>(
  table: RouteTable,
  spec: E,
  handler: (ctx: UploadContext<z.infer<E['body']>, Parsed<E['params']>>) => Promise<unknown>,
  before: RequestHandler[] = [],
): void {
  table.records.push({ method: 'post', path: spec.path, access: spec.access, endpoint: spec });
  register(table, spec);
  table.router.post(spec.path, requireAccess(spec.access), ...before, readFiles(spec.upload), async (req, res) => {
    const files = (req.files as Express.Multer.File[] | undefined) ?? [];
    if (!req.is('multipart/form-data')) throw new AppError('VALIDATION_FAILED', 400, 'Send the photos as multipart/form-data.');
    // The text fields and file names go through the same check as every JSON route's input.
    assertStorable({ params: req.params, body: { ...req.body, [spec.upload.fileField]: files.map((f) => f.originalname) } });
    if (files.length === 0)
      throw new AppError('VALIDATION_FAILED', 400, 'Choose at least one photo.', { [spec.upload.fileField]: 'Choose at least one photo' });
    const ctx = {
      fields: spec.body.parse({ ...req.body }),
      params: spec.params ? spec.params.parse(req.params) : undefined,
      files,
      user: req.user as SessionUser,
      req,
      res,
    } as UploadContext<z.infer<E['body']>, Parsed<E['params']>>;
    res.status(201).json(await handler(ctx));
  });
}

/** multer in memory with hard limits; its errors become the API's error shape and name the file. */
function readFiles(spec: UploadLimits): RequestHandler {
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: spec.maxBytesPerFile, files: spec.maxFiles, fields: 10, fieldSize: 200, parts: spec.maxFiles + 10, headerPairs: 100 },
  }).array(spec.fileField, spec.maxFiles);
  const megabytes = Math.round(spec.maxBytesPerFile / 1024 / 1024);
  return (req, res, next) =>
    upload(req, res, (err?: unknown) => {
      if (!err) return next();
      // Anything else multer passes on comes from busboy reading the body (no boundary, a malformed part header, a
      // body cut short): the client sent something that is not multipart/form-data. Files are kept in memory, so
      // no error of ours can arrive here.
      if (!(err instanceof multer.MulterError)) return next(new AppError('VALIDATION_FAILED', 400, 'The upload is not a complete multipart/form-data body.'));
      // multer 2 names the file on its errors; its type definitions do not say so yet.
      const filename = (err as { filename?: string }).filename;
      const name = filename ? `“${safeFileName(filename)}”` : 'A file';
      if (err.code === 'LIMIT_FILE_SIZE') {
        return next(
          new AppError('PAYLOAD_TOO_LARGE', 413, `${name} is larger than ${megabytes} MB.`, { [spec.fileField]: `${name} is larger than ${megabytes} MB` }),
        );
      }
      if (err.code === 'LIMIT_FILE_COUNT' || (err.code === 'LIMIT_UNEXPECTED_FILE' && err.field === spec.fileField)) {
        return next(
          new AppError('VALIDATION_FAILED', 400, `Send at most ${spec.maxFiles} photos at a time.`, {
            [spec.fileField]: `At most ${spec.maxFiles} photos at a time`,
          }),
        );
      }
      if (err.code === 'LIMIT_UNEXPECTED_FILE') return next(new AppError('VALIDATION_FAILED', 400, `Send files only in the field “${spec.fileField}”.`));
      next(new AppError('VALIDATION_FAILED', 400, 'The upload form is not one Dwell expects.'));
    });
}

function register(table: RouteTable, spec: UploadEndpoint) {
  const { fileField, maxFiles, maxBytesPerFile } = spec.upload;
  const { $schema: _ignored, ...fields } = z.toJSONSchema(spec.body, { io: 'input' }) as Record<string, unknown> & { properties?: object };
  const multipart = {
    ...fields,
    properties: {
      ...fields.properties,
      [fileField]: { type: 'array', maxItems: maxFiles, items: { type: 'string', format: 'binary' } },
    },
  };
  const json = (schema: ZodType) => ({ content: { 'application/json': { schema } } });
  table.registry.registerPath({
    method: 'post',
    path: openApiPath(spec.path),
    summary: spec.summary,
    description: `Access: ${describeAccess(spec.access)}. Files of at most ${maxBytesPerFile} bytes each.`,
    request: {
      body: { content: { 'multipart/form-data': { schema: multipart as never } } },
      ...(spec.params && { params: spec.params as never }),
    },
    responses: {
      201: { description: 'Stored', ...json(spec.response) },
      ...Object.fromEntries([...errorStatuses(spec.access, true), 413, 429].map((s) => [s, { description: 'Error', ...json(ApiErrorBodySchema) }])),
    },
  });
}
