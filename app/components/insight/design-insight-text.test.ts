import { describe, expect, it } from "vitest";
import {
  costChartRows,
  designLabel,
  designsPageHref,
  signedChangeText,
  whatIfSentence,
} from "./design-insight-text";

const noFields = {
  quantity: "",
  copperBase: "",
  aluminiumBase: "",
  date: "",
  basis: "",
  endTurn: {},
};

describe("designLabel", () => {
  it("names the design with its revision", () => {
    expect(designLabel({ name: "Hub 48", revision: 3 })).toBe("Hub 48 · rev 3");
  });
});

describe("costChartRows", () => {
  it("keys each row by design, labels it with its revision and marks an estimated torque", () => {
    const split = {
      activeCopper: 1,
      endTurnCopper: 0.5,
      leadsAndScrap: 0.25,
      magnets: 2,
      parts: 0.25,
    };
    expect(
      costChartRows([
        {
          designId: 7,
          name: "Hub 48",
          revision: 2,
          costPerNm: 4,
          splitPerNm: split,
          complete: true,
          perNmTorque: { source: "estimated" as const, torqueNm: 1.5 },
        },
        {
          designId: 9,
          name: "Spindle",
          revision: 1,
          costPerNm: 5,
          splitPerNm: null,
          complete: true,
          perNmTorque: null,
        },
      ]),
    ).toEqual([
      {
        key: "7",
        label: "Hub 48 · rev 2",
        costPerNm: 4,
        splitPerNm: split,
        complete: true,
        estimated: true,
      },
      {
        key: "9",
        label: "Spindle · rev 1",
        costPerNm: 5,
        splitPerNm: null,
        complete: true,
        estimated: false,
      },
    ]);
  });
});

describe("whatIfSentence", () => {
  const stored = {
    bases: {
      currency: "EUR",
      copper: { pricePerKg: 8.5 },
      aluminium: null,
    },
    whatIf: { copperBase: null, aluminiumBase: null },
    designs: { designs: [{ name: "Hub 48", endTurnScale: 1 }] },
  };

  it("is null when the figures are the stored ones", () => {
    expect(whatIfSentence(stored)).toBeNull();
  });

  it("names each changed base, beside the stored one where there is one, and each end-turn factor", () => {
    expect(
      whatIfSentence({
        ...stored,
        whatIf: { copperBase: 9.25, aluminiumBase: 2.5 },
        designs: {
          designs: [
            { name: "Hub 48", endTurnScale: 1.2 },
            { name: "Spindle", endTurnScale: 1 },
          ],
        },
      }),
    ).toBe(
      "copper base 9.25\u00a0EUR/kg instead of the stored 8.50\u00a0EUR/kg; " +
        "aluminium base 2.50\u00a0EUR/kg; end turns × 1.20 on Hub 48",
    );
  });
});

describe("designsPageHref", () => {
  it("keeps only the filled fields and sets the page", () => {
    expect(designsPageHref(noFields, 2)).toBe("?page=2");
    expect(
      designsPageHref(
        {
          ...noFields,
          quantity: "10",
          copperBase: "9",
          basis: "list",
          endTurn: { "7": "1.1", "8": "" },
        },
        3,
      ),
    ).toBe("?quantity=10&copperBase=9&basis=list&endTurn.7=1.1&page=3");
  });
});

describe("signedChangeText", () => {
  it("gives the change its sign, zero as ±", () => {
    expect(signedChangeText(0.06)).toBe("+0.06");
    expect(signedChangeText(-0.1)).toBe("−0.10");
    expect(signedChangeText(0)).toBe("±0.00");
  });
});
