import type { DocumentType } from '../../shared/schemas/document';

/**
 * The file's type from its first bytes (its "magic number"), never from its name or the type the
 * browser declared, so a renamed executable is refused. Signatures: PDF "%PDF-" (ISO 32000-1, 7.5.2);
 * PNG 89 50 4E 47 0D 0A 1A 0A (RFC 2083 / PNG spec 5.2); JPEG FF D8 FF (ITU T.81 SOI marker);
 * WebP "RIFF" .... "WEBP" (RFC 9649, 2).
 */
export function sniffDocumentType(bytes: Buffer): { mimeType: DocumentType; extension: string } | null {
  const starts = (signature: number[], offset = 0) =>
    bytes.length >= offset + signature.length && signature.every((byte, i) => bytes[offset + i] === byte);
  const ascii = (text: string) => [...text].map((c) => c.charCodeAt(0));
  if (starts(ascii('%PDF-'))) return { mimeType: 'application/pdf', extension: 'pdf' };
  if (starts([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { mimeType: 'image/png', extension: 'png' };
  if (starts([0xff, 0xd8, 0xff])) return { mimeType: 'image/jpeg', extension: 'jpg' };
  if (starts(ascii('RIFF')) && starts(ascii('WEBP'), 8)) return { mimeType: 'image/webp', extension: 'webp' };
  return null;
}
