import { describe, expect, it } from "vitest";
import {
  attachmentDisposition,
  certificateFileName,
  certificateTypeOf,
  maxCertificateBytes,
} from "./certificate-rules";

const bytes = (...values: number[]) => new Uint8Array(values);
const text = (value: string) => new TextEncoder().encode(value);

describe("certificateTypeOf", () => {
  it("knows a PDF by its header %PDF- (ISO 32000-1:2008, 7.5.2)", () => {
    expect(certificateTypeOf(text("%PDF-1.7\n%âãÏÓ\n"))).toBe(
      "application/pdf",
    );
  });

  it("knows a PNG by its 8-byte signature (W3C PNG specification, 5.2: 137 80 78 71 13 10 26 10)", () => {
    expect(
      certificateTypeOf(bytes(137, 80, 78, 71, 13, 10, 26, 10, 0, 0, 0, 13)),
    ).toBe("image/png");
  });

  it("knows a JPEG by its SOI marker and the next marker (ITU-T T.81 B.1.1.3: FF D8, then FF)", () => {
    // A JFIF file: SOI FF D8, then APP0 FF E0.
    expect(certificateTypeOf(bytes(0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10))).toBe(
      "image/jpeg",
    );
  });

  it("refuses HTML, text, an empty file and signatures cut short, whatever their name", () => {
    expect(
      certificateTypeOf(text("<!doctype html><script>alert(1)</script>")),
    ).toBeNull();
    expect(certificateTypeOf(text(" %PDF-1.4"))).toBeNull(); // not at the start
    expect(certificateTypeOf(text("%PDF"))).toBeNull(); // no dash: cut short
    expect(certificateTypeOf(bytes(137, 80, 78, 71))).toBeNull();
    expect(certificateTypeOf(bytes(0xff, 0xd8))).toBeNull();
    expect(certificateTypeOf(bytes())).toBeNull();
  });

  it("holds certificates to 10 MB = 10 × 1024 × 1024 bytes (GNU units: 10 MiB = 10485760 B)", () => {
    expect(maxCertificateBytes).toBe(10_485_760);
  });
});

describe("certificateFileName", () => {
  it("keeps a name that fits its type", () => {
    expect(certificateFileName("Mill cert 3.1.pdf", "application/pdf")).toBe(
      "Mill cert 3.1.pdf",
    );
    expect(certificateFileName("heat.JPEG", "image/jpeg")).toBe("heat.JPEG");
  });

  it("adds the real type's extension, so a saved copy never opens as something else", () => {
    expect(certificateFileName("cert.html", "application/pdf")).toBe(
      "cert.html.pdf",
    );
    expect(certificateFileName("scan", "image/png")).toBe("scan.png");
  });

  it("drops folders, quotes and control characters", () => {
    expect(
      certificateFileName('C:\\scans\\a"b\r\nc.pdf', "application/pdf"),
    ).toBe("abc.pdf");
    expect(certificateFileName("../../etc/x.png", "image/png")).toBe("x.png");
    expect(certificateFileName("\u0000", "image/png")).toBe("certificate.png");
  });

  it("cuts a long name to 160 characters, keeping the extension", () => {
    const name = certificateFileName(
      `${"a".repeat(300)}.pdf`,
      "application/pdf",
    );
    expect(name).toHaveLength(160);
    expect(name.endsWith(".pdf")).toBe(true);
  });
});

describe("attachmentDisposition", () => {
  it("quotes a plain ASCII name (RFC 6266, 4.1 and the example in section 5)", () => {
    expect(attachmentDisposition("example.pdf")).toBe(
      'attachment; filename="example.pdf"',
    );
  });

  it("gives a non-ASCII name as filename* in UTF-8 beside an ASCII stand-in (RFC 6266 section 5 example: €  → %e2%82%ac)", () => {
    // RFC 6266's example: attachment; filename*= UTF-8''%e2%82%ac%20rates
    expect(attachmentDisposition("€ rates.pdf")).toBe(
      "attachment; filename=\"? rates.pdf\"; filename*=UTF-8''%E2%82%AC%20rates.pdf",
    );
    // "Prüfzeugnis": ü is U+00FC, UTF-8 C3 BC (RFC 3629 two-byte form, worked by hand).
    expect(attachmentDisposition("Prüfzeugnis.pdf")).toContain(
      "filename*=UTF-8''Pr%C3%BCfzeugnis.pdf",
    );
  });

  it("percent-encodes the characters RFC 8187 attr-char leaves out", () => {
    expect(attachmentDisposition("é'(x)*.png")).toContain(
      "filename*=UTF-8''%C3%A9%27%28x%29%2A.png",
    );
  });
});
