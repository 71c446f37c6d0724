import { z } from 'zod';
import { IdSchema, InstantSchema } from './common.schemas';

export const PhotoKindSchema = z.enum(['hair_now', 'wanted']);
export type PhotoKind = z.infer<typeof PhotoKindSchema>;

/** Limits the server enforces; the client shows them before anyone picks a file. */
export const PHOTO_LIMITS = {
  bytesPerFile: 10 * 1024 * 1024,
  filesPerRequest: 10,
  perBooking: 10,
  perClient: 30,
  longSidePx: 2400,
} as const;

/** The text fields sent beside the files of a multipart upload. */
export const PhotoUploadFieldsSchema = z.object({ kind: PhotoKindSchema, bookingId: IdSchema.optional() }).strict();
export type PhotoUploadFields = z.infer<typeof PhotoUploadFieldsSchema>;

export const PhotoSchema = z.object({
  id: IdSchema,
  kind: PhotoKindSchema,
  bookingId: IdSchema.nullable(),
  width: z.number().int(),
  height: z.number().int(),
  createdAt: InstantSchema,
  /** Served only to the client and the salon's team, through the API. */
  url: z.string(),
});
export type Photo = z.infer<typeof PhotoSchema>;
export const PhotoListSchema = z.object({ photos: z.array(PhotoSchema) });
