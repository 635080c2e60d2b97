/** Admins add magnet grades on /reference; everyone else may only read them. */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  postForm,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

const password = "reference-admin-password";
const addedNames: string[] = [];
let adminId = "";
let adminCookie = "";
let buyerCookie = "";

beforeAll(async () => {
  const adminEmail = uniqueEmail("grade-admin");
  adminId = await createPerson({
    email: adminEmail,
    password,
    roles: ["admin"],
    name: "Grade Admin",
  });
  adminCookie = await signIn(adminEmail, password);
  const buyerEmail = uniqueEmail("grade-buyer");
  await createPerson({ email: buyerEmail, password, roles: ["buyer"] });
  buyerCookie = await signIn(buyerEmail, password);
});

afterAll(async () => {
  if (addedNames.length > 0) {
    await testDatabase().query("DELETE FROM magnet_grades WHERE name IN (?)", [
      addedNames,
    ]);
  }
  await closeTestDatabase();
});

/** A grade a maker might publish (values near N45SH), under a name no other test uses. */
function dataSheetGrade(
  overrides: Record<string, string> = {},
): Record<string, string> {
  return {
    name: `N45TL${randomBytes(3).toString("hex").toUpperCase()}`,
    material: "sintered-ndfeb",
    temperatureSuffix: "SH",
    brMinT: "1.32",
    brMaxT: "1.37",
    hcbMinKAm: "980",
    hcjMinKAm: "1600",
    bhMaxMinKJm3: "340",
    bhMaxMaxKJm3: "366",
    maxWorkingTemperatureC: "150",
    brTemperatureCoefficientPercentPerK: "-0.11",
    densityGPerCm3: "7.55",
    recoilPermeability: "1.05",
    aliases: "",
    source: "Integration test: an invented maker's data sheet",
    ...overrides,
  };
}

interface ListedGrade {
  name: string;
  material: string;
  brMinT: number;
  brMaxT: number;
  maxWorkingTemperatureC: number;
  brTemperatureCoefficientPerK: number;
  builtIn: boolean;
}

async function listedGrades(cookie: string): Promise<ListedGrade[]> {
  const response = await get("/api/v1/magnet-grades", cookie);
  expect(response.status).toBe(200);
  return (await response.json()) as ListedGrade[];
}

describe("adding a magnet grade on /reference", () => {
  it("stores an admin's grade as not built in, with the admin, and lists it in the API", async () => {
    const grade = dataSheetGrade();
    const response = await postForm("/reference", grade, adminCookie);
    addedNames.push(grade.name!);
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe(
      "/reference?table=magnet-grades",
    );
    expect(
      await (await followRedirect(response, adminCookie)).text(),
    ).toContain(`Added the grade ${grade.name}.`);

    const listed = (await listedGrades(buyerCookie)).find(
      (row) => row.name === grade.name,
    );
    expect(listed).toMatchObject({
      material: "sintered-ndfeb",
      brMinT: 1.32,
      brMaxT: 1.37,
      maxWorkingTemperatureC: 150,
      builtIn: false,
    });
    // Typed in %/K as data sheets print it, kept in 1/K as the engineering modules use it.
    expect(listed!.brTemperatureCoefficientPerK).toBeCloseTo(-0.0011, 10);

    const [rows] = await testDatabase().query(
      "SELECT added_by, built_in, temperature_suffix, grade_key FROM magnet_grades WHERE name = ?",
      [grade.name],
    );
    expect(rows).toEqual([
      {
        added_by: adminId,
        built_in: 0,
        temperature_suffix: "SH",
        grade_key: grade.name!.toLowerCase(),
      },
    ]);

    // The estimate API takes the new grade at once: 1000 mm³ at 7.55 g/cm³ = 7.55 g.
    const base = (await import("../support/app-client")).baseUrl();
    const estimate = await fetch(`${base}/api/v1/magnet-estimates`, {
      method: "POST",
      headers: {
        "Content-Type": "application/json",
        Cookie: buyerCookie,
        Origin: base,
      },
      body: JSON.stringify({
        grade: grade.name,
        shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      }),
    });
    expect(estimate.status).toBe(200);
    expect((await estimate.json()).massPerPieceKg).toBeCloseTo(0.00755, 12);
  });

  it("refuses a buyer with 403 and stores nothing", async () => {
    const grade = dataSheetGrade();
    const response = await postForm("/reference", grade, buyerCookie);
    expect(response.status).toBe(403);
    expect(
      (await listedGrades(buyerCookie)).some((row) => row.name === grade.name),
    ).toBe(false);
  });

  it.each([
    [
      "brMaxT",
      { brMaxT: "13.7" },
      "The highest Br must be between 0.1 and 1.6 T.",
    ],
    [
      "brMaxT",
      { brMaxT: "1.20" },
      "The highest Br cannot be below the lowest.",
    ],
    ["densityGPerCm3", { densityGPerCm3: "" }, "Give the density."],
    [
      "densityGPerCm3",
      // "7,55" now reads as 7.55 (a decimal comma that cannot be a thousands group).
      { densityGPerCm3: "7.5.5" },
      "The density must be a number.",
    ],
    [
      "hcjMinKAm",
      { hcjMinKAm: "500" },
      "HcJ is never below HcB: check the two coercivities.",
    ],
    [
      "maxWorkingTemperatureC",
      { maxWorkingTemperatureC: "150.5" },
      "Give the maximum working temperature in whole degrees.",
    ],
    [
      "brTemperatureCoefficientPercentPerK",
      { brTemperatureCoefficientPercentPerK: "0.12" },
      "The Br temperature coefficient must be between −0.5 and 0 %/K.",
    ],
    [
      "bhMaxMaxKJm3",
      { bhMaxMaxKJm3: "450" },
      "cannot exceed Br²/(4μ0) = 373 kJ/m³.",
    ],
    [
      "temperatureSuffix",
      { material: "smco5" },
      "Temperature suffixes belong to sintered NdFeB grades only.",
    ],
    [
      "name",
      { name: "N45 <b>" },
      "Use letters, digits, spaces and ( ) + - . / only.",
    ],
  ])(
    "refuses a bad %s with 400 and the field's message",
    async (_field, change, message) => {
      const grade = dataSheetGrade(change);
      const response = await postForm("/reference", grade, adminCookie);
      expect(response.status).toBe(400);
      expect(await response.text()).toContain(message);
      expect(
        (await listedGrades(adminCookie)).some(
          (row) => row.name === grade.name,
        ),
      ).toBe(false);
    },
  );

  it("refuses a name that is taken, in any spelling, with 409", async () => {
    const builtIn = await postForm(
      "/reference",
      dataSheetGrade({ name: "N42SH" }),
      adminCookie,
    );
    expect(builtIn.status).toBe(409);
    expect(await builtIn.text()).toContain(
      "There is already a grade called N42SH.",
    );

    const grade = dataSheetGrade();
    expect((await postForm("/reference", grade, adminCookie)).status).toBe(302);
    addedNames.push(grade.name!);
    const again = await postForm(
      "/reference",
      { ...grade, name: grade.name!.toLowerCase() },
      adminCookie,
    );
    expect(again.status).toBe(409);
    expect(await again.text()).toContain(
      `There is already a grade called ${grade.name}.`,
    );

    // Another name of a built-in grade ("Y30" is hard ferrite C5) is taken too, as a name or as an alias.
    const alias = await postForm(
      "/reference",
      dataSheetGrade({ name: "Y30" }),
      adminCookie,
    );
    expect(alias.status).toBe(409);
    const otherName = await postForm(
      "/reference",
      dataSheetGrade({ aliases: "y30" }),
      adminCookie,
    );
    expect(otherName.status).toBe(409);
    expect(await otherName.text()).toContain(
      "already stands for the grade C5 (Y30).",
    );

    const names = (await listedGrades(adminCookie)).map((row) =>
      row.name.toLowerCase(),
    );
    expect(
      names.filter((name) => name === grade.name!.toLowerCase()),
    ).toHaveLength(1);
  });
});
