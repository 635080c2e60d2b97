/**
 * The design pages' own actions and exports, as a browser without JavaScript
 * (or a fetcher) sends them: create a design through the form, save and remove
 * lines, refuse every change to a released revision with the data layer's
 * message, and the BOM CSV export with its formulas neutralised.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, postForm, sendJson, signInAs } from "../support/app-client";
import {
  createMagnetItem,
  createPartItem,
  createWireItem,
} from "../support/build-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
let manager = "";
let wireSku = "";
let magnetSku = "";
let trickySku = "";
let currency = "";
/** A part whose name a spreadsheet would run as a formula. */
const trickyName = '=HYPERLINK("http://example.test","open me")';

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  wireSku = (await createWireItem(buyer)).sku;
  magnetSku = (await createMagnetItem(buyer)).sku;
  trickySku = (await createPartItem(buyer, "pcs", trickyName)).sku;
  // 5 kg of the wire at 14.20 per kg: the moving average cost the stock basis prices it at.
  const store = await createLocation(uniqueCode("DS"));
  const receipt = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "receipt",
      sku: wireSku,
      quantity: 5,
      location: store,
      lot: uniqueCode("SP"),
      unitCost: 14.2,
    },
    storekeeper,
  );
  expect(receipt.status, await receipt.clone().text()).toBe(201);
});
afterAll(closeTestDatabase);

const motorFields = {
  poles: "14",
  slots: "12",
  ratedCurrentA: "10",
  ratedTorqueNm: "0.5",
  torqueBasis: "estimated",
  insulationClassC: "155",
};

/** Worked check 4 of the engineering brief: 50 mm active, 30 mm end turn, 40 turns of 0.80 mm, 150 mm leads, 3 % scrap. */
const workedCoil = () => ({
  intent: "save-line",
  kind: "coil",
  sku: wireSku,
  turns: "40",
  strandsInHand: "1",
  activeLengthMm: "50",
  endTurnLengthMm: "30",
  leadLengthMm: "150",
  coilsPerMotor: "1",
  scrapPercent: "3",
  operatingTemperatureC: "20",
});

async function designCount(name: string): Promise<number> {
  const [[row]] = (await testDatabase().query(
    "SELECT COUNT(*) AS n FROM designs WHERE name = ?",
    [name],
  )) as unknown as [[{ n: number }]];
  return Number(row.n);
}

/** Creates a design through the page's form; returns its page address. */
async function newDesign(): Promise<{ id: number; path: string }> {
  const response = await postForm(
    "/designs",
    { name: `Page motor ${uniqueCode("D")}`, ...motorFields },
    builder,
  );
  expect(response.status, await response.clone().text()).toBe(302);
  const location = response.headers.get("Location") ?? "";
  const match = /^\/designs\/(\d+)\/revisions\/1$/.exec(location);
  expect(match, location).not.toBeNull();
  return { id: Number(match![1]), path: location };
}

interface RevisionJson {
  status: string;
  ratedCurrentA: number;
  ratedTorqueNm: number | null;
  slotAreaMm2: number | null;
  lines: { kind: string; sku: string; endTurnLengthMm?: number }[];
}

async function revisionJson(id: number, revision = 1): Promise<RevisionJson> {
  const response = await get(
    `/api/v1/designs/${id}/revisions/${revision}`,
    builder,
  );
  expect(response.status).toBe(200);
  return (await response.json()) as RevisionJson;
}

async function lineIds(id: number, revision = 1): Promise<number[]> {
  const [rows] = (await testDatabase().query(
    `SELECT l.id FROM design_lines l JOIN design_revisions r ON r.id = l.revision_id
     WHERE r.design_id = ? AND r.revision = ? ORDER BY l.position`,
    [id, revision],
  )) as unknown as [{ id: number }[]];
  return rows.map((row) => row.id);
}

/** The text of a page as a person reads it (scripts, with the page's data, and tags dropped; no-break spaces kept). */
async function shownText(response: Response): Promise<string> {
  const html = await response.text();
  return html
    .replace(/<script[\s\S]*?<\/script>/g, " ")
    .replace(/<!--[\s\S]*?-->/g, "")
    .replace(/<[^>]+>/g, " ")
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, "&");
}

async function pageText(path: string, cookie = builder): Promise<string> {
  const response = await get(path, cookie);
  expect(response.status).toBe(200);
  return shownText(response);
}

describe("the designs page", () => {
  it("creates a design through the form: builders only, field messages for bad input, nothing written", async () => {
    const name = `Refused motor ${uniqueCode("R")}`;
    const refused = await postForm(
      "/designs",
      { name, ...motorFields },
      storekeeper,
    );
    expect(refused.status).toBe(403);

    const bad = await postForm(
      "/designs",
      { name, ...motorFields, poles: "7", ratedCurrentA: "-2" },
      builder,
    );
    expect(bad.status).toBe(400);
    const shown = await shownText(bad);
    expect(shown).toContain("A motor has an even number of poles.");
    expect(shown).toContain("The rated current must be more than 0 A.");
    expect(await designCount(name)).toBe(0);

    const { id } = await newDesign();
    const revision = await revisionJson(id);
    expect(revision).toMatchObject({
      status: "draft",
      ratedCurrentA: 10,
      ratedTorqueNm: 0.5,
      lines: [],
    });

    // The same name twice: the data layer's message beside the name, nothing written.
    const [[{ name: takenName }]] = (await testDatabase().query(
      "SELECT name FROM designs WHERE id = ?",
      [id],
    )) as unknown as [[{ name: string }]];
    const twice = await postForm(
      "/designs",
      { name: takenName, ...motorFields },
      builder,
    );
    expect(twice.status).toBe(409);
    expect(await shownText(twice)).toContain("already exists");
    expect(await designCount(takenName)).toBe(1);
  });

  it("lists the design with its revision for every role", async () => {
    const { id } = await newDesign();
    const [[{ n }]] = (await testDatabase().query(
      "SELECT COUNT(*) AS n FROM designs WHERE name < (SELECT name FROM designs WHERE id = ?)",
      [id],
    )) as unknown as [[{ n: number }]];
    const page = Math.floor(Number(n) / 25) + 1;
    const html = await (await get(`/designs?page=${page}`, manager)).text();
    expect(html).toContain(`href="/designs/${id}/revisions/1"`);
    // Readers get no form to create one.
    expect(html).not.toContain("Create design");
  });
});

describe("the design page's action", () => {
  it("saves a coil line and shows its copper figures (worked check 4)", async () => {
    const { id, path } = await newDesign();
    const saved = await postForm(path, workedCoil(), builder);
    expect(saved.status).toBe(200);
    expect((await revisionJson(id)).lines).toMatchObject([
      { kind: "coil", sku: wireSku },
    ]);

    const text = await pageText(path);
    // Engineering brief, worked check 4 with two 150 mm leads: 6.700 m, 0.22981 Ω at 20 °C.
    expect(text).toContain("6.700\u00a0m");
    expect(text).toContain("0.2298\u00a0Ω");
    // 3 % scrap: 30.84 g drawn from stock (shown to 0.1 g), bare conductor (no enamelled linear mass known).
    expect(text).toContain("30.8\u00a0g");
    expect(text).toContain("bare conductor");
    // Active share: 50 / (50 + 30) = 62.5 %.
    expect(text).toContain("62.5\u00a0%");
    // Copper loss at 10 A, 20 °C: 10² × 0.22981 Ω = 22.98 W (with leads).
    expect(text).toContain("22.98\u00a0W");
  });

  it("refuses a bad line field by field and a coil wound from a magnet, writing nothing", async () => {
    const { id, path } = await newDesign();
    const zeroTurns = await postForm(
      path,
      { ...workedCoil(), turns: "0", activeLengthMm: "" },
      builder,
    );
    expect(zeroTurns.status).toBe(400);
    const shown = await shownText(zeroTurns);
    expect(shown).toContain("The number of turns must be at least 1.");
    expect(shown).toContain("Give the active length as a number.");

    const magnetCoil = await postForm(
      path,
      { ...workedCoil(), sku: magnetSku },
      builder,
    );
    expect(magnetCoil.status).toBe(400);
    expect(await shownText(magnetCoil)).toContain("is not a magnet wire item");
    expect((await revisionJson(id)).lines).toEqual([]);
  });

  it("changes one line by its id, refuses a line changed meanwhile, and removes a line", async () => {
    const { id, path } = await newDesign();
    await postForm(path, workedCoil(), builder);
    await postForm(
      path,
      {
        intent: "save-line",
        kind: "magnet",
        sku: magnetSku,
        piecesPerMotor: "14",
        operatingTemperatureC: "170",
      },
      builder,
    );
    const [coilId, magnetId] = await lineIds(id);

    const changed = await postForm(
      path,
      { ...workedCoil(), lineId: String(coilId), endTurnLengthMm: "60" },
      builder,
    );
    expect(changed.status).toBe(200);
    let revision = await revisionJson(id);
    expect(revision.lines.map((line) => line.kind)).toEqual(["coil", "magnet"]);
    expect(revision.lines[0]!.endTurnLengthMm).toBe(60);

    // Every save gives the lines new ids: the old id is a line that is no longer there.
    const stale = await postForm(
      path,
      { ...workedCoil(), lineId: String(coilId), endTurnLengthMm: "90" },
      builder,
    );
    expect(stale.status).toBe(409);
    expect(await shownText(stale)).toContain("changed or removed meanwhile");
    revision = await revisionJson(id);
    expect(revision.lines[0]!.endTurnLengthMm).toBe(60);

    // The magnet at 170 °C is above N42SH's 150 °C: the page says so beside the line.
    const text = await pageText(path);
    expect(text).toContain("Hotter than the grade");
    expect(text).toContain(
      "above the grade's 150 °C maximum working temperature",
    );
    expect(text).toContain("Handle strong magnets with care");

    const [, newMagnetId] = await lineIds(id);
    expect(newMagnetId).not.toBe(magnetId);
    const removed = await postForm(
      path,
      { intent: "remove-line", lineId: String(newMagnetId) },
      builder,
    );
    expect(removed.status).toBe(200);
    expect((await revisionJson(id)).lines.map((line) => line.kind)).toEqual([
      "coil",
    ]);
  });

  it("saves the motor figures, and an emptied optional figure is stored as not given", async () => {
    const { id, path } = await newDesign();
    const fields = {
      intent: "fields",
      ...motorFields,
      slotAreaMm2: "45",
      coilSidesPerSlot: "2",
      notes: "",
    };
    expect((await postForm(path, fields, builder)).status).toBe(200);
    expect((await revisionJson(id)).slotAreaMm2).toBe(45);
    expect(
      (
        await postForm(
          path,
          { ...fields, slotAreaMm2: "", ratedCurrentA: "12" },
          builder,
        )
      ).status,
    ).toBe(200);
    expect(await revisionJson(id)).toMatchObject({
      slotAreaMm2: null,
      ratedCurrentA: 12,
    });

    const bad = await postForm(path, { ...fields, poles: "0" }, builder);
    expect(bad.status).toBe(400);
    expect(await shownText(bad)).toContain(
      "The pole count must be at least 2.",
    );
    expect((await revisionJson(id)).slotAreaMm2).toBeNull();
  });

  it("lets only builders change a design, and answers 400 when it does not say what to change", async () => {
    const { id, path } = await newDesign();
    for (const cookie of [manager, storekeeper, buyer]) {
      expect((await postForm(path, workedCoil(), cookie)).status).toBe(403);
      expect((await postForm(path, { intent: "release" }, cookie)).status).toBe(
        403,
      );
    }
    expect((await revisionJson(id)).lines).toEqual([]);
    expect((await postForm(path, {}, builder)).status).toBe(400);
    expect((await postForm(path, { intent: "wipe" }, builder)).status).toBe(
      400,
    );
  });

  it("refuses every change to a released revision with the data layer's message, and changes nothing", async () => {
    const { id, path } = await newDesign();
    // An empty revision cannot be released.
    const empty = await postForm(path, { intent: "release" }, builder);
    expect(empty.status).toBe(409);
    expect(await shownText(empty)).toContain(
      "without lines cannot be released",
    );

    await postForm(path, workedCoil(), builder);
    const released = await postForm(path, { intent: "release" }, builder);
    expect(released.status).toBe(200);
    expect((await revisionJson(id)).status).toBe("released");
    const [lineId] = await lineIds(id);

    const attempts: Record<string, string>[] = [
      { ...workedCoil(), lineId: String(lineId), endTurnLengthMm: "90" },
      workedCoil(),
      { intent: "remove-line", lineId: String(lineId) },
      { intent: "fields", ...motorFields, ratedCurrentA: "99" },
      { intent: "release" },
    ];
    for (const attempt of attempts) {
      const response = await postForm(path, attempt, builder);
      expect(response.status, attempt.intent).toBe(409);
      expect(await shownText(response)).toContain(
        attempt.intent === "release"
          ? "is released and cannot be changed"
          : "Revision 1 is released and cannot be changed. Start a new revision to make changes.",
      );
    }
    const after = await revisionJson(id);
    expect(after).toMatchObject({ status: "released", ratedCurrentA: 10 });
    expect(after.lines).toHaveLength(1);
    expect(after.lines[0]!.endTurnLengthMm).toBe(30);
    expect(await lineIds(id)).toEqual([lineId]);

    // The page is read-only now, and offers the next revision.
    const text = await pageText(path);
    expect(text).toContain("released and read-only");
    expect(text).toContain("Start revision 2");
    expect(text).not.toContain("Save motor figures");
    expect(text).not.toContain("Add a coil line");
    expect(text).not.toContain("Remove");

    const next = await postForm(path, { intent: "new-revision" }, builder);
    expect(next.status).toBe(302);
    expect(next.headers.get("Location")).toBe(`/designs/${id}/revisions/2`);
    expect((await revisionJson(id, 2)).lines).toHaveLength(1);
  });
});

describe("costs, the printable BOM and the CSV export", () => {
  it("prices the coil at the stock average and shows money to the cent with its source", async () => {
    const { id, path } = await newDesign();
    await postForm(path, workedCoil(), builder);
    const costing = (await (
      await get(
        `/api/v1/designs/${id}/revisions/1/costing?basis=stock-average`,
        builder,
      )
    ).json()) as { currency: string; costPerMotor: number };
    currency = costing.currency;
    // 0.0308378 kg drawn (worked check 4 with 3 % scrap) × 14.20 per kg = 0.43789676 → 0.4379.
    expect(costing.costPerMotor).toBe(0.4379);

    const text = await pageText(`${path}?basis=stock-average`, manager);
    expect(text).toContain(`0.44\u00a0${currency}`);
    expect(text).toContain("moving average cost of stock");
    // 0.4379 / 0.5 N·m = 0.8758 → 0.88 per N·m.
    expect(text).toContain(`0.88\u00a0${currency}/N·m`);
    expect(text).toContain("First-order estimate");

    // The best price: no supplier quotes this wire, so the line says it has no price.
    const best = await pageText(path, manager);
    expect(best).toContain("Incomplete");
    expect(best).toContain("no price");

    const printed = await pageText(
      `${path}/print?quantity=10&basis=stock-average`,
      manager,
    );
    expect(printed).toContain("Bill of materials");
    // For 10 motors: 0.308378 kg, rounded up to the gram as a build reserves it.
    expect(printed).toContain("0.309\u00a0kg");
    expect(printed).toContain("Where the money of one motor goes");
  });

  it("exports the BOM as CSV with formula text neutralised", async () => {
    const { id, path } = await newDesign();
    await postForm(path, workedCoil(), builder);
    await postForm(
      path,
      {
        intent: "save-line",
        kind: "part",
        sku: trickySku,
        quantityPerMotor: "2",
      },
      builder,
    );
    const response = await get(
      `${path}/bom.csv?quantity=10&basis=stock-average`,
      manager,
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("Content-Type")).toContain("text/csv");
    expect(response.headers.get("Content-Disposition")).toMatch(
      /^attachment; filename="turnledger-bom-page-motor-d-[0-9a-f]{8}-rev1\.csv"$/,
    );
    const bytes = new Uint8Array(await response.arrayBuffer());
    // A byte-order mark first, so spreadsheet programs read UTF-8 (fetch's text() drops it).
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const text = new TextDecoder().decode(bytes);
    expect(text.startsWith("line,kind,sku,item,")).toBe(true);
    const rows = text
      .replace(/^\uFEFF/, "")
      .trim()
      .split("\r\n");
    expect(rows).toHaveLength(3);
    const header = rows[0]!.split(",");
    expect(header).toContain("quantity for 10 motors");
    expect(rows[1]).toContain(
      `1,coil,${wireSku},Enamelled copper 0.80 mm grade 2,0.0308378,kg,0.309,bare conductor,14.2,0.4379,moving average cost of stock,40,1,50,30,150,1,3,20,6.7`,
    );
    // The part's name would run as a formula: it is written as text, with a leading apostrophe.
    expect(rows[2]).toContain(
      `2,part,${trickySku},"'=HYPERLINK(""http://example.test"",""open me"")",2,pcs,20,`,
    );
    expect(text).not.toMatch(/,=HYPERLINK/);

    expect((await get(`${path}/bom.csv?quantity=0`, manager)).status).toBe(400);
    expect(
      (await get(`/designs/${id}/revisions/7/bom.csv`, manager)).status,
    ).toBe(404);
  });

  it("shows a real design's pages to every role", async () => {
    const { path } = await newDesign();
    await postForm(path, workedCoil(), builder);
    for (const cookie of [buyer, builder, storekeeper, manager]) {
      expect((await get(path, cookie)).status).toBe(200);
      expect((await get(`${path}/print`, cookie)).status).toBe(200);
      expect((await get(`${path}/bom.csv`, cookie)).status).toBe(200);
    }
    expect((await get(path)).status).toBe(302);
  });
});
