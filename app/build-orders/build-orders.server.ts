/**
 * Build orders: creating one for N motors of a released design revision, the paged list,
 * and the released revisions a builder can choose from.
 */
import {
  and,
  asc,
  count,
  desc,
  eq,
  inArray,
  like,
  lt,
  or,
  sql,
  type SQL,
} from "drizzle-orm";
import { db } from "~/db/client.server";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  buildOrderEvents,
  buildOrderLines,
  buildOrders,
  designRevisions,
  designs,
  items,
  users,
} from "~/db/schema";
import {
  findRevision,
  loadRevisionLines,
} from "~/designs/design-revisions.server";
import { isEngineeringInputError } from "~/engineering/errors";
import {
  formatQuantityText,
  formatUnitCostText,
  parseUnitCost,
} from "~/lib/decimal-amounts";
import { containsPattern } from "~/lib/list-filters";
import { BuildOrderError } from "./build-order-errors";
import type { BuildOrderListFilter } from "./build-order-list-address";
import type { BuildOrderCreateInput } from "./build-order-forms";
import { itemRequirements } from "./build-order-requirements";
import {
  buildOrderIdInReference,
  type BuildOrderStatus,
} from "./build-order-status";

/**
 * What N motors of a revision need, one entry per item; refuses (409) a revision whose
 * lines cannot be worked out or whose items are stocked in another unit.
 */
export async function requirementsForRevision(
  revisionId: number,
  motors: number,
) {
  const lines = await loadRevisionLines(revisionId);
  if (lines.length === 0)
    throw new BuildOrderError(
      409,
      "This revision has no lines: there is nothing to build from it.",
      "revision",
    );
  let requirements;
  try {
    requirements = itemRequirements(lines, motors);
  } catch (error) {
    if (isEngineeringInputError(error))
      throw new BuildOrderError(
        409,
        `A line of this revision cannot be worked out: ${error.message}`,
        "revision",
      );
    if (error instanceof RangeError)
      throw new BuildOrderError(400, error.message, "quantity");
    throw error;
  }
  const stocked = await db
    .select({
      id: items.id,
      sku: items.sku,
      unit: items.unit,
      averageCost: items.averageCost,
    })
    .from(items)
    .where(
      inArray(
        items.id,
        requirements.map((requirement) => requirement.itemId),
      ),
    );
  const byId = new Map(stocked.map((item) => [item.id, item]));
  return requirements.map((requirement) => {
    const item = byId.get(requirement.itemId);
    if (!item)
      throw new BuildOrderError(
        409,
        `${requirement.sku} is no longer in the catalogue.`,
        "revision",
      );
    if (item.unit !== requirement.unit)
      throw new BuildOrderError(
        409,
        `${item.sku} is stocked in ${item.unit}, but the design counts it in ${requirement.unit}.`,
        "revision",
      );
    const averageCost = parseUnitCost(item.averageCost);
    return {
      ...requirement,
      /** The moving average cost now; null while the item has never been received at a cost. */
      plannedUnitCost: averageCost > 0n ? averageCost : null,
    };
  });
}

/** Creates a draft build order; 404 for an unknown revision, 409 for a draft one. */
export async function createBuildOrder(
  input: BuildOrderCreateInput,
  userId: string,
): Promise<{ id: number; status: BuildOrderStatus }> {
  const found = await findRevision(input.designId, input.revision);
  if (!found)
    throw new BuildOrderError(
      404,
      `Design ${input.designId} has no revision ${input.revision}.`,
      "revision",
    );
  if (found.revision.status !== "released")
    throw new BuildOrderError(
      409,
      `Revision ${input.revision} of ${found.design.name} is a draft: release it before building it.`,
      "revision",
    );
  const requirements = await requirementsForRevision(
    found.revision.id,
    input.quantity,
  );
  return writeTransaction(async (tx) => {
    const now = new Date();
    const [created] = await tx
      .insert(buildOrders)
      .values({
        designId: found.design.id,
        revisionId: found.revision.id,
        quantity: input.quantity,
        status: "draft",
        note: input.note ?? "",
        plannedStart: input.plannedStart ?? null,
        userId,
        createdAt: now,
        updatedAt: now,
      })
      .$returningId();
    const orderId = created!.id;
    await tx.insert(buildOrderLines).values(
      requirements.map((requirement) => ({
        orderId,
        itemId: requirement.itemId,
        required: formatQuantityText(requirement.required),
        plannedUnitCost:
          requirement.plannedUnitCost === null
            ? null
            : formatUnitCostText(requirement.plannedUnitCost),
      })),
    );
    await tx.insert(buildOrderEvents).values({
      orderId,
      fromStatus: null,
      toStatus: "draft",
      note: `${input.quantity} × ${found.design.name} revision ${input.revision}${input.plannedStart ? `, planned start ${input.plannedStart}` : ""}.`,
      userId,
      createdAt: now,
    });
    return { id: orderId, status: "draft" as const };
  });
}

export interface BuildOrderListQuery extends BuildOrderListFilter {
  page: number;
  pageSize: number;
}

/** Build orders with their design, revision and who created them: what the list and the order page both show. */
export function selectBuildOrderSummaries() {
  return db
    .select({
      id: buildOrders.id,
      status: buildOrders.status,
      quantity: buildOrders.quantity,
      note: buildOrders.note,
      plannedStart: buildOrders.plannedStart,
      createdAt: buildOrders.createdAt,
      updatedAt: buildOrders.updatedAt,
      designId: designs.id,
      designName: designs.name,
      revision: designRevisions.revision,
      createdBy: users.name,
    })
    .from(buildOrders)
    .innerJoin(designs, eq(designs.id, buildOrders.designId))
    .innerJoin(designRevisions, eq(designRevisions.id, buildOrders.revisionId))
    .innerJoin(users, eq(users.id, buildOrders.userId));
}

/**
 * The list's filters as one condition. A search naming an order ("BO-12", "12") finds that
 * order; other text finds the orders of the designs whose name holds it, through their
 * revisions (the revision index), since designs are few and orders many.
 */
async function buildOrderConditions(
  filter: BuildOrderListFilter,
): Promise<SQL | undefined> {
  const conditions: SQL[] = [];
  if (filter.status) conditions.push(eq(buildOrders.status, filter.status));
  const search = filter.search?.trim();
  if (search) {
    const orderId = /^\d{1,10}$/.test(search)
      ? Number(search)
      : buildOrderIdInReference(search);
    const revisions = await db
      .select({ id: designRevisions.id })
      .from(designRevisions)
      .innerJoin(designs, eq(designs.id, designRevisions.designId))
      .where(like(designs.name, containsPattern(search)));
    const revisionIds = revisions.map((revision) => revision.id);
    conditions.push(
      or(
        orderId !== null ? eq(buildOrders.id, orderId) : undefined,
        revisionIds.length > 0
          ? inArray(buildOrders.revisionId, revisionIds)
          : undefined,
        // Nothing named: no order matches.
        sql`FALSE`,
      )!,
    );
  }
  return conditions.length > 0 ? and(...conditions) : undefined;
}

/** A page of build orders, newest first (on the status index when filtered). */
export async function listBuildOrders(query: BuildOrderListQuery) {
  const where = await buildOrderConditions(query);
  const [counted] = await db
    .select({ total: count() })
    .from(buildOrders)
    .where(where);
  const rows = await selectBuildOrderSummaries()
    .where(where)
    .orderBy(desc(buildOrders.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return {
    total: counted?.total ?? 0,
    buildOrders: rows.map(buildOrderListRow),
  };
}

function buildOrderListRow(
  row: Awaited<ReturnType<typeof selectBuildOrderSummaries>>[number],
) {
  return {
    id: row.id,
    status: row.status,
    design: { id: row.designId, name: row.designName },
    revision: row.revision,
    quantity: row.quantity,
    note: row.note,
    plannedStart: row.plannedStart,
    createdBy: row.createdBy,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** Every build order matching the filters, newest first, a batch at a time (after the last id read). */
export async function* buildOrdersInBatches(
  filter: BuildOrderListFilter,
  batchSize = 1000,
) {
  const where = await buildOrderConditions(filter);
  let afterId: number | undefined;
  for (;;) {
    const rows = await selectBuildOrderSummaries()
      .where(
        and(
          where,
          afterId !== undefined ? lt(buildOrders.id, afterId) : undefined,
        ),
      )
      .orderBy(desc(buildOrders.id))
      .limit(batchSize);
    if (rows.length > 0) yield rows.map(buildOrderListRow);
    if (rows.length < batchSize) return;
    afterId = rows[rows.length - 1]!.id;
  }
}

/** Released revisions a build can be made of, by design name, newest revision first. */
export async function listReleasedRevisions() {
  return db
    .select({
      designId: designs.id,
      designName: designs.name,
      revision: designRevisions.revision,
      releasedAt: designRevisions.releasedAt,
    })
    .from(designRevisions)
    .innerJoin(designs, eq(designs.id, designRevisions.designId))
    .where(eq(designRevisions.status, "released"))
    .orderBy(asc(designs.name), desc(designRevisions.revision));
}
