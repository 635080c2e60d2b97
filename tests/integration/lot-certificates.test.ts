/**
 * Certificates on a lot: an upload is stored once per content (SHA-256) and comes back
 * only as a download, byte for byte, with its type, `attachment`, nosniff and a policy
 * that runs nothing. An oversize file (refused by Content-Length before reading, or by the
 * parser while it arrives) and a file of another type (HTML named .pdf and sent as
 * application/pdf) are refused beside the file field, and nothing is stored.
 */
import { createHash, randomBytes } from "node:crypto";
import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, followRedirect, get, signInAs } from "../support/app-client";
import { createWireItem, receive } from "../support/build-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

/** 10 MB as the form says it: 10 × 1024 × 1024 bytes (GNU units: 10 MiB = 10485760 B). */
const tenMegabytes = 10_485_760;

let storekeeper = "";
let manager = "";
let lotId = 0;
let lotNumber = "";
let sku = "";

/** A small but real-looking PDF: the %PDF- header (ISO 32000-1, 7.5.2), random body, %%EOF. */
function pdfBytes(size = 2048): Uint8Array<ArrayBuffer> {
  const head = new TextEncoder().encode("%PDF-1.7\n");
  const tail = new TextEncoder().encode("\n%%EOF\n");
  const bytes = new Uint8Array(size);
  bytes.set(randomBytes(size));
  bytes.set(head, 0);
  bytes.set(tail, size - tail.length);
  return bytes;
}

function upload(
  bytes: Uint8Array<ArrayBuffer>,
  fileName: string,
  type: string,
  cookie = storekeeper,
  title = "",
) {
  const form = new FormData();
  form.append("title", title);
  form.append("file", new Blob([bytes], { type }), fileName);
  return fetch(`${baseUrl()}/stock/lots/${lotId}`, {
    method: "POST",
    redirect: "manual",
    headers: { Cookie: cookie, Origin: baseUrl() },
    body: form,
  });
}

async function storedCounts() {
  const [rows] = await testDb().execute(
    sql`SELECT (SELECT COUNT(*) FROM document_contents) AS contents,
               (SELECT COUNT(*) FROM lot_documents) AS documents`,
  );
  const row = (
    rows as unknown as { contents: number; documents: number }[]
  )[0]!;
  return { contents: Number(row.contents), documents: Number(row.documents) };
}

async function documentsOfLot() {
  const response = await get(
    `/api/v1/lots/${lotNumber}/documents?sku=${encodeURIComponent(sku)}`,
    manager,
  );
  expect(response.status).toBe(200);
  return (
    (await response.json()) as {
      documents: {
        id: number;
        fileName: string;
        contentType: string;
        sizeBytes: number;
        sha256: string;
        url: string;
      }[];
    }
  ).documents;
}

beforeAll(async () => {
  const buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  const rack = await createLocation(uniqueCode("CRT"));
  const wire = await createWireItem(buyer);
  sku = wire.sku;
  lotNumber = uniqueCode("CERT");
  await receive(storekeeper, {
    sku,
    lot: lotNumber,
    location: rack,
    quantity: 5,
    unitCost: 12,
  });
  const answer = await (
    await get(`/api/v1/lots/${lotNumber}/where-used?sku=${sku}`, manager)
  ).json();
  lotId = answer.lot.id;
});

afterAll(closeTestDatabase);

describe("attaching and downloading a certificate", () => {
  it("stores a PDF and gives it back byte for byte, as an attachment that is never sniffed", async () => {
    const bytes = pdfBytes();
    const response = await upload(
      bytes,
      "Mill certificate 3.1.pdf",
      "application/pdf",
      storekeeper,
      "Mill certificate",
    );
    expect(response.status, await response.clone().text()).toBe(302);
    expect(response.headers.get("location")).toBe(`/stock/lots/${lotId}`);
    const page = await (await followRedirect(response, storekeeper)).text();
    expect(page).toContain("Certificate attached to the lot.");
    expect(page).toContain("Mill certificate");

    const [document] = await documentsOfLot();
    // SHA-256 computed here by Node's crypto over the bytes sent, not by the app's code path.
    expect(document).toMatchObject({
      fileName: "Mill certificate 3.1.pdf",
      contentType: "application/pdf",
      sizeBytes: 2048,
      sha256: createHash("sha256").update(bytes).digest("hex"),
    });
    const download = await get(document!.url, manager);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("application/pdf");
    expect(download.headers.get("content-disposition")).toBe(
      'attachment; filename="Mill certificate 3.1.pdf"',
    );
    expect(download.headers.get("x-content-type-options")).toBe("nosniff");
    expect(download.headers.get("content-security-policy")).toBe(
      "default-src 'none'; sandbox",
    );
    expect(download.headers.get("cache-control")).toContain("no-store");
    expect(
      Buffer.from(await download.arrayBuffer()).equals(Buffer.from(bytes)),
    ).toBe(true);
  });

  it("judges the type by content: a PNG sent as application/octet-stream named .bin is kept as a PNG", async () => {
    // The PNG signature (W3C PNG specification 5.2) and an IHDR chunk's length and name.
    const png = new Uint8Array([
      137,
      80,
      78,
      71,
      13,
      10,
      26,
      10,
      0,
      0,
      0,
      13,
      73,
      72,
      68,
      82,
      ...randomBytes(64),
    ]);
    const response = await upload(
      png,
      "Prüfzeugnis.bin",
      "application/octet-stream",
    );
    expect(response.status, await response.clone().text()).toBe(302);
    const [newest] = await documentsOfLot();
    expect(newest).toMatchObject({
      fileName: "Prüfzeugnis.bin.png",
      contentType: "image/png",
    });
    const download = await get(newest!.url, manager);
    expect(download.headers.get("content-type")).toBe("image/png");
    // RFC 6266 with RFC 8187: an ASCII stand-in and the UTF-8 name (ü = C3 BC).
    expect(download.headers.get("content-disposition")).toBe(
      "attachment; filename=\"Pr?fzeugnis.bin.png\"; filename*=UTF-8''Pr%C3%BCfzeugnis.bin.png",
    );
    expect(
      Buffer.from(await download.arrayBuffer()).equals(Buffer.from(png)),
    ).toBe(true);
  });

  it("keeps the same content once, named twice", async () => {
    const bytes = pdfBytes(4096);
    const before = await storedCounts();
    for (const name of ["first.pdf", "second.pdf"])
      expect((await upload(bytes, name, "application/pdf")).status).toBe(302);
    const after = await storedCounts();
    expect(after).toEqual({
      contents: before.contents + 1,
      documents: before.documents + 2,
    });
  });

  it("serves a certificate only under its own lot, and only to people signed in", async () => {
    const [document] = await documentsOfLot();
    expect(
      (
        await get(
          `/stock/lots/${lotId + 100000}/documents/${document!.id}`,
          manager,
        )
      ).status,
    ).toBe(404);
    const anonymous = await get(document!.url);
    expect(anonymous.status).toBe(302);
  });
});

describe("refused uploads store nothing", () => {
  it("refuses HTML named .pdf and sent as application/pdf (415, beside the file field)", async () => {
    const before = await storedCounts();
    const html = new TextEncoder().encode(
      "<!doctype html><title>x</title><script>alert(1)</script>",
    );
    const response = await upload(html, "certificate.pdf", "application/pdf");
    expect(response.status).toBe(415);
    expect(await response.text()).toContain(
      "Only PDF, PNG or JPEG files can be attached",
    );
    expect(await storedCounts()).toEqual(before);
  });

  it("refuses a file one byte over 10 MB while it arrives (413) and stores nothing", async () => {
    const before = await storedCounts();
    const response = await upload(
      pdfBytes(tenMegabytes + 1),
      "big.pdf",
      "application/pdf",
    );
    expect(response.status).toBe(413);
    expect(await response.text()).toContain("The file is larger than 10 MB");
    expect(await storedCounts()).toEqual(before);
  });

  it("takes a file of exactly 10 MB and gives it back whole", async () => {
    const bytes = pdfBytes(tenMegabytes);
    const response = await upload(bytes, "exact.pdf", "application/pdf");
    expect(response.status, await response.clone().text()).toBe(302);
    const [newest] = await documentsOfLot();
    expect(newest).toMatchObject({
      fileName: "exact.pdf",
      sizeBytes: tenMegabytes,
    });
    const download = await get(newest!.url, manager);
    expect(
      Buffer.from(await download.arrayBuffer()).equals(Buffer.from(bytes)),
    ).toBe(true);
  });

  it("refuses a body whose Content-Length is over the limit before reading it (413)", async () => {
    const before = await storedCounts();
    const response = await upload(
      pdfBytes(12 * 1024 * 1024),
      "huge.pdf",
      "application/pdf",
    );
    expect(response.status).toBe(413);
    expect(await response.text()).toContain("The file is larger than 10 MB");
    expect(await storedCounts()).toEqual(before);
  });

  it("refuses an upload from a manager (403) and stores nothing", async () => {
    const before = await storedCounts();
    const response = await upload(
      pdfBytes(),
      "x.pdf",
      "application/pdf",
      manager,
    );
    expect(response.status).toBe(403);
    expect(await storedCounts()).toEqual(before);
  });
});
