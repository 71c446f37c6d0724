import type { z } from 'zod';
import { CreateConsultationSchema } from '@shared/schemas/consultation.schemas';

/** The consultation form: the same schema the server checks, without the client (from the page) and the quote (its own form). */
export const ConsultationFormSchema = CreateConsultationSchema.pick({ consultation: true, photoIds: true });
export type ConsultationFormInput = z.input<typeof ConsultationFormSchema>;
export type ConsultationFormValues = z.output<typeof ConsultationFormSchema>;
