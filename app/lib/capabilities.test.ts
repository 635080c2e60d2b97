import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import {
  capabilityRoles,
  needsRoleMessage,
  rolesWith,
  userCan,
  whoCanText,
  type Capability,
} from "./capabilities";
import { roles, type Role } from "./roles";

describe("capabilityRoles", () => {
  // Who may do what; a change here changes the guard, the controls and the
  // route × role test at once, so it is made on purpose or not at all.
  it("gives each capability the roles the product's role table gives it", () => {
    expect(capabilityRoles).toEqual({
      recordStock: ["storekeeper"],
      keepCatalogue: ["buyer"],
      keepReorderLevels: ["buyer", "storekeeper"],
      keepSuppliers: ["buyer"],
      importPriceLists: ["buyer"],
      keepPrices: ["buyer"],
      hearLowStockAlerts: ["buyer"],
      draftPurchaseRequests: ["buyer"],
      orderPurchases: ["buyer"],
      receivePurchases: ["storekeeper"],
      editDesigns: ["builder"],
      releaseDesigns: ["builder"],
      createBuildOrders: ["builder"],
      runBuildOrders: ["builder"],
      issueToBuildOrders: ["storekeeper"],
      takeBuildOrderSteps: ["builder", "storekeeper"],
      managePeople: ["admin"],
      readOutbox: ["admin"],
      addMagnetGrades: ["admin"],
      // Issue 20: a storekeeper or admin holds a lot; a manager or admin reviews a stocktake.
      holdLots: ["storekeeper"],
      attachLotDocuments: ["storekeeper", "buyer"],
      startStocktakes: ["storekeeper"],
      countStock: ["storekeeper"],
      approveStocktakes: ["manager"],
      // The product's role table: storekeepers print labels.
      printLabels: ["storekeeper"],
    });
  });

  it("lets whoever takes one build-order step onto the order's page, and nobody else", () => {
    const stepRoles = new Set([
      ...rolesWith("runBuildOrders"),
      ...rolesWith("issueToBuildOrders"),
    ]);
    expect(new Set(rolesWith("takeBuildOrderSteps"))).toEqual(stepRoles);
  });

  it("gives managers one capability, the review of stocktakes: otherwise they read", () => {
    const managerCan = (Object.keys(capabilityRoles) as Capability[]).filter(
      (capability) => userCan({ roles: ["manager"] }, capability),
    );
    expect(managerCan).toEqual(["approveStocktakes"]);
  });
});

describe("userCan", () => {
  it("passes a person holding one of the capability's roles", () => {
    expect(userCan({ roles: ["manager", "storekeeper"] }, "recordStock")).toBe(
      true,
    );
    expect(userCan({ roles: ["storekeeper"] }, "keepReorderLevels")).toBe(true);
  });
  it("refuses a person holding none of them", () => {
    expect(userCan({ roles: ["storekeeper"] }, "keepCatalogue")).toBe(false);
    expect(userCan({ roles: ["buyer", "builder"] }, "managePeople")).toBe(
      false,
    );
  });
  it("gives admins every capability", () => {
    for (const capability of Object.keys(capabilityRoles) as Capability[])
      expect(userCan({ roles: ["admin"] }, capability)).toBe(true);
  });
  it("refuses nobody signed in", () => {
    expect(userCan(null, "recordStock")).toBe(false);
    expect(userCan(undefined, "readOutbox")).toBe(false);
  });
  it("knows only the five roles", () => {
    const named = Object.values(capabilityRoles).flat() as Role[];
    expect(named.every((role) => roles.includes(role))).toBe(true);
  });
});

describe("needsRoleMessage", () => {
  it("names the capability's roles in the table's order", () => {
    expect(needsRoleMessage("keepReorderLevels")).toBe(
      "This needs the role buyer or storekeeper.",
    );
    expect(needsRoleMessage("issueToBuildOrders", "This step")).toBe(
      "This step needs the role storekeeper.",
    );
  });
});

describe("where access is decided", () => {
  /** Every source file under app/, beside this table and the roles module itself. */
  function sourcesOf(folder: string): string[] {
    return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
      const path = join(folder, entry.name);
      if (entry.isDirectory()) return sourcesOf(path);
      return /\.tsx?$/.test(entry.name) && !/\.test\.tsx?$/.test(entry.name)
        ? [path]
        : [];
    });
  }

  it("asks the capability table everywhere, never roles directly", () => {
    const own = new Set(["app/lib/capabilities.ts", "app/lib/roles.ts"]);
    const asking = sourcesOf("app")
      .filter((path) => !own.has(path))
      .filter((path) => /\buserHasRole\b/.test(readFileSync(path, "utf8")));
    expect(asking).toEqual([]);
  });
});

describe("whoCanText", () => {
  it("names the roles with their article, admins last and once", () => {
    expect(whoCanText("keepSuppliers")).toBe("A buyer or an admin");
    expect(whoCanText("takeBuildOrderSteps")).toBe(
      "A builder, a storekeeper or an admin",
    );
    expect(whoCanText("managePeople")).toBe("An admin");
  });
});
