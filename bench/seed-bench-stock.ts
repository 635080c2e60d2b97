/**
 * Loads a large store for the benchmarks: 20,000 items and 1,000,000
 * movements, written with multi-row INSERTs (the ledger code would take an
 * hour for a million rows). Balances and item totals are computed from the
 * generated movements, so the data obeys the ledger's rules: every balance is
 * the sum of its movements and none is negative.
 */
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";

const itemCount = 20_000;
const movementCount = 1_000_000;
const batchRows = 2_000;

function randomSequence(seed: number) {
  let state = seed;
  return () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
}

export async function seedBenchStock(
  databaseUrl: string,
  userId: string,
): Promise<{ skus: string[]; locationCode: string }> {
  const connection = await mysql.createConnection({
    ...poolOptionsFromUrl(databaseUrl),
    multipleStatements: false,
  });
  const random = randomSequence(7);
  try {
    await connection.query(
      "INSERT INTO locations (code, name, kind) VALUES ('BENCH-STORE', 'Benchmark store', 'store'), ('BENCH-BIN', 'Benchmark bin', 'bin')",
    );
    const [locationRows] = await connection.query(
      "SELECT id, code FROM locations WHERE code IN ('BENCH-STORE', 'BENCH-BIN') ORDER BY code",
    );
    const [binId, storeId] = (locationRows as { id: number }[]).map(
      (row) => row.id,
    ) as [number, number];

    const skus: string[] = [];
    for (let start = 0; start < itemCount; start += batchRows) {
      const rows: unknown[][] = [];
      for (
        let index = start;
        index < Math.min(itemCount, start + batchRows);
        index += 1
      ) {
        const sku = `BENCH-${String(index).padStart(5, "0")}`;
        skus.push(sku);
        const kind =
          index % 3 === 0 ? "wire" : index % 3 === 1 ? "magnet" : "part";
        rows.push([
          sku,
          `Bench item ${index} ${kind}`,
          kind,
          kind === "wire" ? "kg" : "pcs",
          kind === "wire"
            ? `IEC ${(0.2 + (index % 40) * 0.05).toFixed(3)} mm`
            : "",
          index % 7 === 0 ? "50.000" : "0.000",
        ]);
      }
      await connection.query(
        "INSERT INTO items (sku, name, kind, unit, size_or_grade, reorder_point, created_at, updated_at) VALUES ?",
        [rows.map((row) => [...row, new Date(), new Date()])],
      );
    }
    const [itemRows] = await connection.query(
      "SELECT id, sku, unit FROM items WHERE sku LIKE 'BENCH-%' ORDER BY id",
    );
    const benchItems = itemRows as { id: number; sku: string; unit: string }[];

    // Movements: receipts first in time, then issues that never take a balance below zero.
    const onHand = new Map<string, number>(); // `${itemId}:${locationId}` → thousandths
    const itemOnHand = new Map<number, number>();
    const started = Date.now() - 365 * 86_400_000;
    let written = 0;
    while (written < movementCount) {
      const rows: unknown[][] = [];
      for (
        let row = 0;
        row < batchRows && written < movementCount;
        row += 1, written += 1
      ) {
        const item = benchItems[Math.floor(random() * benchItems.length)]!;
        const locationId = random() < 0.7 ? storeId : binId;
        const key = `${item.id}:${locationId}`;
        const held = onHand.get(key) ?? 0;
        const wire = item.unit === "kg";
        let quantity: number;
        let type: string;
        if (held > 0 && random() < 0.55) {
          type = "issue";
          quantity = -Math.min(
            held,
            wire
              ? Math.floor(random() * 2000) + 1
              : (Math.floor(random() * 10) + 1) * 1000,
          );
        } else {
          type = "receipt";
          quantity = wire
            ? Math.floor(random() * 20_000) + 1000
            : (Math.floor(random() * 200) + 1) * 1000;
        }
        onHand.set(key, held + quantity);
        const after = (itemOnHand.get(item.id) ?? 0) + quantity;
        itemOnHand.set(item.id, after);
        rows.push([
          type,
          item.id,
          0,
          locationId,
          (quantity / 1000).toFixed(3),
          type === "receipt" ? "10.0000" : null,
          "10.0000",
          (after / 1000).toFixed(3),
          userId,
          new Date(started + written * 30_000),
        ]);
      }
      await connection.query(
        "INSERT INTO stock_movements (type, item_id, lot_id, location_id, quantity, unit_cost, average_cost_after, item_on_hand_after, user_id, created_at) VALUES ?",
        [rows],
      );
    }

    const balanceRows = [...onHand.entries()].map(([key, thousandths]) => {
      const [itemId, locationId] = key.split(":").map(Number);
      return [
        itemId,
        0,
        locationId,
        (thousandths / 1000).toFixed(3),
        "0.000",
        new Date(),
      ];
    });
    for (let start = 0; start < balanceRows.length; start += batchRows) {
      await connection.query(
        "INSERT INTO stock_balances (item_id, lot_id, location_id, on_hand, reserved, updated_at) VALUES ?",
        [balanceRows.slice(start, start + batchRows)],
      );
    }
    const itemUpdates = [...itemOnHand.entries()];
    for (let start = 0; start < itemUpdates.length; start += batchRows) {
      const slice = itemUpdates.slice(start, start + batchRows);
      await connection.query(
        `UPDATE items SET average_cost = '10.0000', on_hand = CASE id ${slice.map(() => "WHEN ? THEN ?").join(" ")} END WHERE id IN (?)`,
        [
          ...slice.flatMap(([id, thousandths]) => [
            id,
            (thousandths / 1000).toFixed(3),
          ]),
          slice.map(([id]) => id),
        ],
      );
    }
    await connection.query(
      "ANALYZE TABLE items, stock_movements, stock_balances",
    );
    return { skus, locationCode: "BENCH-STORE" };
  } finally {
    await connection.end();
  }
}
