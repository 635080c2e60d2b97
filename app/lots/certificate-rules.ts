/**
 * What a lot certificate may be and how it is named on the way out: PDF, PNG or JPEG,
 * at most 10 MB, its type read from its first bytes (never from the browser's
 * Content-Type or the file's extension), and the `Content-Disposition` of its download.
 * Pure: no framework, no Node; tested beside itself.
 */

/** The most one certificate may have: 10 MB (MiB). */
export const maxCertificateBytes = 10 * 1024 * 1024;

/** Said beside the file field and in the API. */
export const certificateTooLargeMessage =
  "The file is larger than 10 MB, the most a certificate may be. Scan it at a lower resolution or split it.";

export const certificateWrongTypeMessage =
  "Only PDF, PNG or JPEG files can be attached; this file's content is none of them.";

export const certificateEmptyMessage = "Choose the certificate's file.";

export type CertificateType = "application/pdf" | "image/png" | "image/jpeg";

const signatures: { type: CertificateType; bytes: readonly number[] }[] = [
  // "%PDF-": the file header every PDF starts with (ISO 32000-1:2008, 7.5.2 "File Header").
  { type: "application/pdf", bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] },
  // The PNG signature 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948, W3C PNG specification 5.2).
  {
    type: "image/png",
    bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a],
  },
  // JPEG: the SOI marker FF D8 then the first marker's FF (ITU-T T.81, B.1.1.3; the WHATWG
  // MIME Sniffing Standard's image pattern FF D8 FF).
  { type: "image/jpeg", bytes: [0xff, 0xd8, 0xff] },
];

/** The file's type judged by its first bytes, or null when it is none of PDF, PNG, JPEG. */
export function certificateTypeOf(bytes: Uint8Array): CertificateType | null {
  for (const signature of signatures) {
    if (
      bytes.length >= signature.bytes.length &&
      signature.bytes.every((byte, index) => bytes[index] === byte)
    )
      return signature.type;
  }
  return null;
}

const extensions: Record<CertificateType, readonly string[]> = {
  "application/pdf": [".pdf"],
  "image/png": [".png"],
  "image/jpeg": [".jpg", ".jpeg"],
};

/**
 * The name a certificate is kept and downloaded under: the last part of what was sent (no
 * folders), control characters and quotes dropped, at most 160 characters, ending in the
 * extension of its real type (a PDF sent as "cert.html" is kept as "cert.html.pdf", so a
 * saved copy never opens as something else).
 */
export function certificateFileName(
  sent: string,
  type: CertificateType,
): string {
  const base =
    sent
      .split(/[\\/]/)
      .pop()!
      // C0 and C1 controls, DEL, quotes: never in a header or on a page.
      // eslint-disable-next-line no-control-regex
      .replace(/[\u0000-\u001f\u007f-\u009f"]/g, "")
      .trim() || "certificate";
  const wanted = extensions[type];
  const lower = base.toLowerCase();
  const named = wanted.some((extension) => lower.endsWith(extension))
    ? base
    : `${base}${wanted[0]}`;
  if (named.length <= 160) return named;
  const extension = named.slice(named.lastIndexOf("."));
  return `${named.slice(0, 160 - extension.length)}${extension}`;
}

/** RFC 5987 / RFC 8187 attr-char: everything else is percent-encoded in UTF-8. */
function encodeExtValue(text: string): string {
  return encodeURIComponent(text).replace(
    /['()*]/g,
    (character) => `%${character.charCodeAt(0).toString(16).toUpperCase()}`,
  );
}

/**
 * `attachment; filename="…"` (RFC 6266 section 4.1): a plain ASCII name as it is; any other
 * name gets an ASCII stand-in ("?" for each other character) and `filename*=UTF-8''…`
 * (RFC 8187), which every current browser prefers (RFC 6266 section 4.3).
 */
export function attachmentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^\x20-\x7e]/g, "?").replace(/["\\]/g, "_");
  if (ascii === fileName) return `attachment; filename="${fileName}"`;
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeExtValue(fileName)}`;
}
