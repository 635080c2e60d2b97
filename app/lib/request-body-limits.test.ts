import { describe, expect, it } from "vitest";
import {
  designRevisionBodyBytes,
  formAndJsonBodyBytes,
  lotCertificateBodyCeilingBytes,
  priceListUploadBodyBytes,
  requestBodyLimit,
} from "./request-body-limits";
import { maxPriceListBytes } from "~/price-lists/decode-csv";

describe("requestBodyLimit", () => {
  it("holds forms and JSON to 64 KB", () => {
    expect(formAndJsonBodyBytes).toBe(65_536);
    for (const [method, path] of [
      ["POST", "/sign-in"],
      ["POST", "/sign-in.data"],
      ["POST", "/api/v1/sessions"],
      ["POST", "/api/v1/designs"],
      ["GET", "/api/v1/designs/1/revisions/1"],
      ["POST", "/api/v1/designs/1/revisions/1/release"],
      ["POST", "/suppliers/import"],
      ["PUT", "/api/v1/price-lists"],
    ] as const) {
      const limit = requestBodyLimit(method, path);
      expect(limit.bytes, `${method} ${path}`).toBe(formAndJsonBodyBytes);
      expect(limit.apiMessage).toBe(
        "The request is larger than 64 KB, the most Turnledger takes here.",
      );
      expect(limit.pageMessage).toMatch(/^The form is larger than 64 KB/);
    }
  });

  it("lets a price-list upload carry its 20 MB file and its fields", () => {
    const limit = requestBodyLimit("post", "/api/v1/price-lists");
    expect(limit.bytes).toBe(priceListUploadBodyBytes);
    expect(limit.bytes).toBe(maxPriceListBytes + 1024 * 1024);
    expect(limit.apiMessage).toBe("The file is larger than 20 MB.");
    expect(limit.field).toBe("file");
    expect(requestBodyLimit("POST", "/api/v1/price-lists/").bytes).toBe(
      priceListUploadBodyBytes,
    );
  });

  it("lets a design revision carry its 200 lines", () => {
    for (const method of ["PUT", "PATCH"]) {
      const limit = requestBodyLimit(method, "/api/v1/designs/12/revisions/3");
      expect(limit.bytes).toBe(designRevisionBodyBytes);
      expect(limit.apiMessage).toBe(
        "The request is larger than 256 KB, the most Turnledger takes here.",
      );
    }
  });

  it("lets a lot certificate's upload reach its route, which holds the file to 10 MB", () => {
    for (const path of ["/stock/lots/12", "/stock/lots/12.data"])
      expect(requestBodyLimit("POST", path).bytes, path).toBe(
        lotCertificateBodyCeilingBytes,
      );
    // The hold and release forms beside it are small forms.
    for (const path of ["/stock/lots/12/hold", "/stock/lots/12/release"])
      expect(requestBodyLimit("POST", path).bytes, path).toBe(
        formAndJsonBodyBytes,
      );
  });

  it("raises no limit for a path that only resembles a raised one", () => {
    for (const path of [
      "/api/v1/price-lists/x",
      "/api/v1/price-listsx",
      "/x/api/v1/price-lists",
      "/api/v1/designs/1/revisions/1/costing",
      "/api/v1/designs/1/revisions",
    ]) {
      expect(requestBodyLimit("POST", path).bytes, path).toBe(
        formAndJsonBodyBytes,
      );
      expect(requestBodyLimit("PUT", path).bytes, path).toBe(
        formAndJsonBodyBytes,
      );
    }
  });
});
