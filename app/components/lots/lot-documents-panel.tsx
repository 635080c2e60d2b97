/**
 * A lot's certificates: each one a download (never shown in the page), and for those who
 * may attach them, the upload form with its limits said beside the file field.
 */
import { Form, useNavigation } from "react-router";
import { formatDateTime, formatQuantity } from "~/lib/format";

export interface LotDocumentRow {
  id: number;
  fileName: string;
  title: string;
  contentType: string;
  sizeBytes: number;
  addedBy: string;
  addedAt: string;
}

export interface UploadErrors {
  file?: string[];
  title?: string[];
  form?: string[];
}

const typeNames: Record<string, string> = {
  "application/pdf": "PDF",
  "image/png": "PNG",
  "image/jpeg": "JPEG",
};

function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024
    ? formatQuantity(bytes / (1024 * 1024), "MB", 1)
    : formatQuantity(Math.max(1, Math.round(bytes / 1024)), "KB");
}

export function LotDocumentsPanel({
  lotId,
  documents,
  canAttach,
  errors,
}: {
  lotId: number;
  documents: LotDocumentRow[];
  canAttach: boolean;
  errors: UploadErrors | undefined;
}) {
  const busy = useNavigation().state === "submitting";
  return (
    <section aria-labelledby="documents-heading" className="panel space-y-3">
      <h2 id="documents-heading" className="text-lg font-semibold">
        Certificates
      </h2>
      {documents.length === 0 ? (
        <p className="text-sm text-graphite-500">
          No certificate attached yet.
        </p>
      ) : (
        <ul className="space-y-2 text-sm">
          {documents.map((document) => (
            <li key={document.id}>
              <a
                href={`/stock/lots/${lotId}/documents/${document.id}`}
                download={document.fileName}
                className="font-medium text-copper-700 underline-offset-2 hover:underline"
              >
                {document.title || document.fileName}
              </a>
              <span className="block text-graphite-500">
                {document.title ? `${document.fileName} · ` : ""}
                {typeNames[document.contentType] ?? document.contentType},{" "}
                {sizeText(document.sizeBytes)} · {document.addedBy},{" "}
                {formatDateTime(document.addedAt)}
              </span>
            </li>
          ))}
        </ul>
      )}
      {canAttach ? (
        <Form
          // A new certificate listed starts the form afresh.
          key={documents.length}
          method="post"
          encType="multipart/form-data"
          className="space-y-3 border-t border-rule pt-3"
        >
          <div>
            <label htmlFor="certificate-file" className="field-label">
              Certificate file
            </label>
            <input
              id="certificate-file"
              name="file"
              type="file"
              required
              accept="application/pdf,image/png,image/jpeg,.pdf,.png,.jpg,.jpeg"
              aria-describedby={
                errors?.file
                  ? "certificate-file-error certificate-file-hint"
                  : "certificate-file-hint"
              }
              aria-invalid={errors?.file ? true : undefined}
              className="block w-full text-sm"
            />
            <p
              id="certificate-file-hint"
              className="mt-1 text-xs text-graphite-500"
            >
              PDF, PNG or JPEG, at most 10 MB. The type is read from the file
              itself.
            </p>
            {errors?.file ? (
              <p
                id="certificate-file-error"
                className="field-error"
                role="alert"
              >
                {errors.file.join(" ")}
              </p>
            ) : null}
          </div>
          <div>
            <label htmlFor="certificate-title" className="field-label">
              Title (optional)
            </label>
            <input
              id="certificate-title"
              name="title"
              maxLength={120}
              placeholder="e.g. Mill certificate 3.1"
              className="field-input"
              autoComplete="off"
            />
            {errors?.title ? (
              <p className="field-error">{errors.title.join(" ")}</p>
            ) : null}
          </div>
          <button type="submit" className="button-quiet" disabled={busy}>
            {busy ? "Attaching…" : "Attach certificate"}
          </button>
        </Form>
      ) : null}
    </section>
  );
}
