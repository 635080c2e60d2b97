/**
 * Certificates attached to lots: reading an upload (bounded while it arrives), accepting
 * it (size, type from its first bytes), storing it (the bytes once per SHA-256 in
 * `document_contents`, the name in `lot_documents`, one transaction) and reading it back
 * for a download. A refused upload stores nothing.
 */
import { createHash } from "node:crypto";
import {
  FormDataParseError,
  MaxFileSizeExceededError,
  MaxTotalSizeExceededError,
  MultipartParseError,
  parseFormData,
} from "@remix-run/form-data-parser";
import { and, desc, eq, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { documentContents, lotDocuments, lots, users } from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  certificateEmptyMessage,
  certificateFileName,
  certificateTooLargeMessage,
  certificateTypeOf,
  certificateWrongTypeMessage,
  maxCertificateBytes,
  type CertificateType,
} from "./certificate-rules";

/** Room for the form's other fields and the multipart framing beside the file. */
const formRoomBytes = 64 * 1024;

/** Why an upload was refused, for the field it belongs to. */
export interface UploadRefusal {
  status: number;
  field: "file" | "title" | "";
  message: string;
}

export interface CertificateUpload {
  bytes: Uint8Array;
  sentName: string;
  title: string;
}

/**
 * Reads the upload form: refused at once by its Content-Length when that is over the
 * limit (nothing of the body is read), otherwise read with the file held to 10 MB as it
 * arrives (a chunked body has no Content-Length to judge).
 */
export async function readCertificateUpload(
  request: Request,
): Promise<CertificateUpload | UploadRefusal> {
  const declared = Number(request.headers.get("Content-Length") ?? "");
  if (
    Number.isFinite(declared) &&
    declared > maxCertificateBytes + formRoomBytes
  )
    return { status: 413, field: "file", message: certificateTooLargeMessage };
  let form: FormData;
  try {
    form = await parseFormData(request, {
      maxFiles: 1,
      maxFileSize: maxCertificateBytes,
      maxParts: 10,
      maxTotalSize: maxCertificateBytes + formRoomBytes,
    });
  } catch (error) {
    if (
      error instanceof MaxFileSizeExceededError ||
      error instanceof MaxTotalSizeExceededError
    )
      return {
        status: 413,
        field: "file",
        message: certificateTooLargeMessage,
      };
    if (
      error instanceof FormDataParseError ||
      error instanceof MultipartParseError
    )
      return {
        status: 400,
        field: "file",
        message: "Send the certificate as a file upload (multipart/form-data).",
      };
    throw error;
  }
  const file = form.get("file");
  const title = String(form.get("title") ?? "").trim();
  if (title.length > 120)
    return {
      status: 400,
      field: "title",
      message: "Use at most 120 characters.",
    };
  if (!(file instanceof File) || file.size === 0)
    return { status: 400, field: "file", message: certificateEmptyMessage };
  return {
    bytes: new Uint8Array(await file.arrayBuffer()),
    sentName: file.name,
    title,
  };
}

export function isUploadRefusal<Accepted extends object>(
  value: Accepted | UploadRefusal,
): value is UploadRefusal {
  return "message" in value;
}

export interface AcceptedCertificate {
  bytes: Uint8Array;
  type: CertificateType;
  fileName: string;
  title: string;
  sha256: string;
}

/**
 * The one gate every certificate passes before it is stored: its size, and its type from
 * its first bytes. A virus scanner plugs in here (README "Lot certificates"): scan
 * `upload.bytes` and return a refusal for an infected file; nothing is stored then.
 */
export async function acceptCertificateUpload(
  upload: CertificateUpload,
): Promise<AcceptedCertificate | UploadRefusal> {
  if (upload.bytes.byteLength > maxCertificateBytes)
    return { status: 413, field: "file", message: certificateTooLargeMessage };
  const type = certificateTypeOf(upload.bytes);
  if (!type)
    return { status: 415, field: "file", message: certificateWrongTypeMessage };
  return {
    bytes: upload.bytes,
    type,
    fileName: certificateFileName(upload.sentName, type),
    title: upload.title,
    sha256: createHash("sha256").update(upload.bytes).digest("hex"),
  };
}

/** Stores an accepted certificate on the lot: its bytes once per content, its row; one transaction. Returns the document's id. */
export async function storeLotDocument(
  lotId: number,
  certificate: AcceptedCertificate,
  userId: string,
): Promise<number> {
  return writeTransaction(
    async (tx) => {
      // The bytes travel as base64 (4/3 of their size: 13.3 MB at the 10 MB limit) and are
      // decoded by the server: the client library would write a Buffer into the statement as
      // hex, twice its size, over MariaDB's default max_allowed_packet of 16 MB.
      const base64 = Buffer.from(certificate.bytes).toString("base64");
      // The same content stored before is kept as it is; any other failure (a NULL from
      // FROM_BASE64 under a low max_allowed_packet among them) is an error, not ignored.
      await tx
        .insert(documentContents)
        .values({
          sha256: certificate.sha256,
          sizeBytes: certificate.bytes.byteLength,
          content: sql`FROM_BASE64(${base64})`,
        })
        .onDuplicateKeyUpdate({ set: { sha256: sql`sha256` } });
      const [row] = await tx
        .insert(lotDocuments)
        .values({
          lotId,
          fileName: certificate.fileName,
          contentType: certificate.type,
          sizeBytes: certificate.bytes.byteLength,
          sha256: certificate.sha256,
          title: certificate.title,
          userId,
        })
        .$returningId();
      return row!.id;
    },
    { label: "lot certificate" },
  );
}

/** A lot's certificates, newest first (`lot_documents_lot_idx`). */
export async function listLotDocuments(lotId: number) {
  const rows = await db
    .select({
      id: lotDocuments.id,
      fileName: lotDocuments.fileName,
      title: lotDocuments.title,
      contentType: lotDocuments.contentType,
      sizeBytes: lotDocuments.sizeBytes,
      sha256: lotDocuments.sha256,
      addedBy: users.name,
      addedAt: lotDocuments.createdAt,
    })
    .from(lotDocuments)
    .innerJoin(users, eq(users.id, lotDocuments.userId))
    .where(eq(lotDocuments.lotId, lotId))
    .orderBy(desc(lotDocuments.id));
  return rows.map((row) => ({ ...row, addedAt: row.addedAt.toISOString() }));
}

/** One certificate of the lot with its bytes, or null (also when it belongs to another lot). */
export async function readLotDocument(lotId: number, documentId: number) {
  const [row] = await db
    .select({
      fileName: lotDocuments.fileName,
      contentType: lotDocuments.contentType,
      content: documentContents.content,
    })
    .from(lotDocuments)
    .innerJoin(
      documentContents,
      eq(documentContents.sha256, lotDocuments.sha256),
    )
    .where(and(eq(lotDocuments.id, documentId), eq(lotDocuments.lotId, lotId)))
    .limit(1);
  return row ?? null;
}

/** True when the lot exists. */
export async function lotExists(lotId: number): Promise<boolean> {
  const [row] = await db
    .select({ id: lots.id })
    .from(lots)
    .where(eq(lots.id, lotId))
    .limit(1);
  return Boolean(row);
}
