import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import {
  alertChange,
  alertMail,
  alertModeOf,
  digestMail,
  purchaseRequestCsv,
} from "./low-stock";

// Quantities in thousandths of the unit: 5_000n is 5 kg.
describe("when an alert opens and closes", () => {
  it("opens on a drop below the reorder point, once", () => {
    expect(
      alertChange({
        available: 4_999n,
        reorderPoint: 5_000n,
        alertOpen: false,
      }),
    ).toBe("open");
    expect(
      alertChange({ available: 1_000n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("none");
  });

  it("closes when available is back at the reorder point, not before", () => {
    expect(
      alertChange({ available: 4_999n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("none");
    expect(
      alertChange({ available: 5_000n, reorderPoint: 5_000n, alertOpen: true }),
    ).toBe("close");
  });

  it("never opens without a reorder point, and closes one that was removed", () => {
    expect(
      alertChange({ available: 0n, reorderPoint: 0n, alertOpen: false }),
    ).toBe("none");
    expect(
      alertChange({ available: 0n, reorderPoint: 0n, alertOpen: true }),
    ).toBe("close");
  });
});

describe("who hears about alerts", () => {
  const person = (
    roles: string[],
    mode: "each" | "digest" | "none" | null,
  ) => ({
    id: "p",
    email: "p@example.test",
    roles,
    mode,
  });
  it("tells buyers each alert by default, admins only when they opt in", () => {
    expect(alertModeOf(person(["buyer"], null))).toBe("each");
    expect(alertModeOf(person(["buyer"], "digest"))).toBe("digest");
    expect(alertModeOf(person(["admin"], null))).toBe("none");
    expect(alertModeOf(person(["admin"], "each"))).toBe("each");
    // A storekeeper's stored choice does not make them a recipient.
    expect(alertModeOf(person(["storekeeper"], "each"))).toBe("none");
  });
});

describe("the e-mails", () => {
  it("names the item, the figures, the best offer and the build orders waiting", () => {
    const mail = alertMail({
      sku: "CU-050",
      name: "Enamelled copper 0.50 mm",
      unit: "kg",
      available: 2_500n,
      reorderPoint: 5_000n,
      reorderQuantity: 25_000n,
      bestOffer: {
        supplier: "Aster Wire",
        supplierSku: "AW-050",
        unitPrice: 12.5,
        currency: "EUR",
      },
      unpricedOffers: [],
      buildOrders: [{ id: 7, status: "in_progress", stillNeeded: 1_200n }],
      itemUrl: "http://localhost:3000/stock/items/CU-050",
    });
    expect(mail.subject).toBe("Low stock: CU-050 Enamelled copper 0.50 mm");
    expect(mail.text).toContain("Available now: 2.500 kg");
    expect(mail.text).toContain("Reorder point: 5.000 kg");
    expect(mail.text).toContain("Suggested order: 25.000 kg");
    expect(mail.text).toContain(
      "Aster Wire, their SKU AW-050, 12.5000 EUR per kg",
    );
    expect(mail.text).toContain("#7 (in progress, 1.200 kg still to issue)");
  });

  it("writes pieces as words: per piece, 1 piece, 3 pieces", () => {
    const mail = alertMail({
      sku: "BR-608",
      name: "Bearing 608",
      unit: "pcs",
      available: 1_000n,
      reorderPoint: 4_000n,
      reorderQuantity: 3_000n,
      bestOffer: {
        supplier: "Lund Parts",
        supplierSku: "LP-608",
        unitPrice: 1.5,
        currency: "EUR",
      },
      unpricedOffers: [],
      buildOrders: [{ id: 9, status: "reserved", stillNeeded: 1_000n }],
      itemUrl: "http://localhost:3000/stock/items/BR-608",
    });
    expect(mail.text).toContain(
      "Available now: 1 piece (on hand less reserved)",
    );
    expect(mail.text).toContain("Reorder point: 4 pieces");
    // Shortfall 4 − 1 = 3 equals the reorder quantity of 3.
    expect(mail.text).toContain("Suggested order: 3 pieces");
    expect(mail.text).toContain(
      "Lund Parts, their SKU LP-608, 1.5000 EUR per piece",
    );
    expect(mail.text).toContain("#9 (reserved, 1 piece still to issue)");
    expect(mail.text).not.toMatch(/\bpcs\b/);
  });

  it("lists each reason an offer cannot be priced on a line of its own", () => {
    const mail = alertMail({
      sku: "CU-050",
      name: "Enamelled copper 0.50 mm",
      unit: "kg",
      available: 9_500n,
      reorderPoint: 10_000n,
      reorderQuantity: 0n,
      bestOffer: null,
      unpricedOffers: [
        {
          supplier: "Kiso Wire",
          supplierSku: "KW-050",
          reasons: [
            "no copper base price in JPY on or before 2026-01-20",
            "no JPY to EUR rate on or before 2026-01-20",
          ],
        },
      ],
      buildOrders: [],
      itemUrl: "http://localhost:3000/stock/items/CU-050",
    });
    expect(mail.text).toContain(
      "No supplier's price can be worked out for that quantity.",
    );
    expect(mail.text).not.toContain("No supplier quotes");
    expect(mail.text).toContain(
      "- Kiso Wire, their SKU KW-050: no copper base price in JPY on or before 2026-01-20\n- Kiso Wire, their SKU KW-050: no JPY to EUR rate on or before 2026-01-20",
    );
  });

  it("lists every open alert in the digest", () => {
    const mail = digestMail(
      [
        {
          sku: "A",
          name: "One",
          unit: "pcs",
          available: 2_000n,
          reorderPoint: 10_000n,
          openedAt: new Date("2026-12-01T08:00:00Z"),
        },
        {
          sku: "B",
          name: "Two",
          unit: "kg",
          available: 0n,
          reorderPoint: 1_500n,
          openedAt: new Date("2026-11-30T08:00:00Z"),
        },
      ],
      "http://localhost:3000/alerts",
    );
    expect(mail.subject).toBe("Low stock digest: 2 items below reorder point");
    expect(mail.text).toContain(
      "- A One: 2 pieces available, reorder point 10 pieces (low since 2026-12-01)",
    );
    expect(mail.text).toContain(
      "- B Two: 0.000 kg available, reorder point 1.500 kg",
    );
  });
});

describe("the purchase request CSV", () => {
  it("prices each line exactly and neutralises formula-like text", () => {
    const csv = purchaseRequestCsv([
      {
        sku: "CU-050",
        name: '=HYPERLINK("x")',
        supplierSku: "AW-050",
        quantity: 25_000n,
        unit: "kg",
        unitPrice: 125_000n,
        currency: "EUR",
      },
      {
        sku: "BR-608",
        name: "Bearing",
        supplierSku: "+608",
        quantity: 3_000n,
        unit: "pcs",
        unitPrice: 3_333n,
        currency: "EUR",
      },
    ]);
    const parsed = Papa.parse<string[]>(csv.replace(/^\uFEFF/, "").trim()).data;
    expect(parsed[0]).toEqual([
      "our_sku",
      "description",
      "supplier_sku",
      "quantity",
      "unit",
      "unit_price",
      "currency",
      "line_total",
    ]);
    // 25 kg × 12.5000 = 312.50 (by hand).
    expect(parsed[1]).toEqual([
      "CU-050",
      '\'=HYPERLINK("x")',
      "AW-050",
      "25",
      "kg",
      "12.5",
      "EUR",
      "312.5",
    ]);
    // 3 × 0.3333 = 0.9999 → 1.00 to the cent, half away from zero (by hand).
    expect(parsed[2]).toEqual([
      "BR-608",
      "Bearing",
      "'+608",
      "3",
      "pcs",
      "0.3333",
      "EUR",
      "1",
    ]);
  });
});
