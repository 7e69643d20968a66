import { z } from 'zod';

/** Files a clinician may attach: letters and handouts (PDF) and photos of the playing setup. */
export const DOCUMENT_TYPES = ['application/pdf', 'image/png', 'image/jpeg', 'image/webp'] as const;
export const DocumentTypeSchema = z.enum(DOCUMENT_TYPES);
export type DocumentType = z.infer<typeof DocumentTypeSchema>;

/** 10 MB: a scanned letter or a phone photo fits; anything larger is refused with 413. */
export const MAX_DOCUMENT_BYTES = 10 * 1024 * 1024;

/** Private: the clinician only. Shared: the musician may read and download it too. Never a teacher. */
export const DocumentVisibilitySchema = z.enum(['private', 'shared']);
export type DocumentVisibility = z.infer<typeof DocumentVisibilitySchema>;

export const DocumentSchema = z.object({
  id: z.string(),
  title: z.string(),
  fileName: z.string(),
  mimeType: DocumentTypeSchema,
  sizeBytes: z.number().int(),
  visibility: DocumentVisibilitySchema,
  createdAt: z.string(),
});
export type DocumentRecord = z.infer<typeof DocumentSchema>;

const title = z
  .string({ error: 'Give the document a title.' })
  .trim()
  .min(1, { error: 'Give the document a title.' })
  .max(160, { error: 'Keep the title under 160 characters.' });

/** The text fields of the multipart upload (the file itself goes in the field `file`). */
export const DocumentUploadFieldsSchema = z.object({
  title,
  visibility: DocumentVisibilitySchema.default('private'),
});
export type DocumentUploadFields = z.infer<typeof DocumentUploadFieldsSchema>;

export const UpdateDocumentSchema = z
  .object({ title: title.optional(), visibility: DocumentVisibilitySchema.optional() })
  .refine((body) => body.title !== undefined || body.visibility !== undefined, { error: 'Change at least one field.' });
export type UpdateDocument = z.infer<typeof UpdateDocumentSchema>;
