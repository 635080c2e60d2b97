/**
 * The server's metrics, read by Prometheus from GET /metrics (server/app.ts,
 * docs/decisions/025-metrics.md). One registry per process, kept across the
 * dev server's module reloads so a metric is never registered twice.
 *
 * What the rest of the app calls:
 * - `observeRequest` (server/app.ts, once per answered request);
 * - `countTransactionRetry(reason)` (the transaction retry helper);
 * - `observePriceListImport(seconds)` (the price-list commit);
 * - `metricsText()` (the /metrics answer).
 *
 * The database's figures (outbox backlog, open alerts) are read when
 * Prometheus asks, with a short time limit: a database that is down or slow
 * reports them as NaN in that scrape (and turnledger_database_figures_up 0)
 * instead of failing it.
 */
import {
  Counter,
  Gauge,
  Histogram,
  Registry,
  collectDefaultMetrics,
} from "prom-client";
import { countOpenAlerts } from "~/alerts/stock-alerts.server";
import { poolFigures } from "~/db/pool-figures.server";
import { outboxBacklog } from "~/mail/outbox-backlog.server";

function createMetrics() {
  const registry = new Registry();
  collectDefaultMetrics({ register: registry });

  const requests = new Counter({
    name: "turnledger_http_requests_total",
    help: "HTTP requests answered, by route id, method and status.",
    labelNames: ["route", "method", "status"] as const,
    registers: [registry],
  });
  const requestDuration = new Histogram({
    name: "turnledger_http_request_duration_seconds",
    help: "Time from a request's arrival to the end of its answer, by route id, method and status.",
    labelNames: ["route", "method", "status"] as const,
    // Pages answer in milliseconds; imports and reports may take seconds.
    buckets: [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
    registers: [registry],
  });
  const transactionRetries = new Counter({
    name: "turnledger_transaction_retries_total",
    help: "Database transactions run again after a conflict, by reason: deadlock (an InnoDB deadlock or a Galera certification conflict, both error 1213) or lock_wait_timeout.",
    labelNames: ["reason"] as const,
    registers: [registry],
  });
  const priceListImportDuration = new Histogram({
    name: "turnledger_price_list_import_duration_seconds",
    help: "Time to commit a price list's rows to the catalogue (successful or refused).",
    buckets: [0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10, 30, 60],
    registers: [registry],
  });
  const poolConnections = new Gauge({
    name: "turnledger_db_pool_connections",
    help: "Database connections of this server's pool: in_use (lent to a request), idle (open, free) and waiting (requests queued for a connection).",
    labelNames: ["state"] as const,
    registers: [registry],
    collect() {
      const figures = poolFigures();
      for (const [state, value] of Object.entries(figures))
        this.set({ state }, value);
    },
  });
  const databaseFiguresUp = new Gauge({
    name: "turnledger_database_figures_up",
    help: "1 when this scrape read the database's figures (outbox, alerts), 0 when the database did not answer in time.",
    registers: [registry],
  });
  const outboxUnsent = new Gauge({
    name: "turnledger_mail_outbox_unsent",
    help: "E-mails in the outbox that SMTP has not accepted yet and that will still be tried.",
    registers: [registry],
  });
  const outboxOldestAge = new Gauge({
    name: "turnledger_mail_outbox_oldest_unsent_age_seconds",
    help: "How long the oldest unsent e-mail has waited (0 when none waits).",
    registers: [registry],
  });
  const openAlerts = new Gauge({
    name: "turnledger_stock_alerts_open",
    help: "Low-stock alerts open now (one per item at most).",
    registers: [registry],
  });
  return {
    registry,
    poolConnections,
    databaseFiguresUp,
    outboxUnsent,
    outboxOldestAge,
    openAlerts,
    requests,
    requestDuration,
    transactionRetries,
    priceListImportDuration,
  };
}

type Metrics = ReturnType<typeof createMetrics>;
const globalForMetrics = globalThis as unknown as {
  turnledgerMetrics?: Metrics;
};
const metrics = (globalForMetrics.turnledgerMetrics ??= createMetrics());

/** The registry /metrics reads; other modules add their gauges to it. */
export const registry = metrics.registry;

/** Counts one answered request and its duration (seconds). */
export function observeRequest(answer: {
  route: string;
  method: string;
  status: number;
  seconds: number;
}): void {
  const labels = {
    route: answer.route,
    method: answer.method,
    status: String(answer.status),
  };
  metrics.requests.inc(labels);
  metrics.requestDuration.observe(labels, answer.seconds);
}

/**
 * Counts a transaction that is run again. `reason` is a short fixed word
 * (e.g. "deadlock", "lock_wait_timeout"), never a message with values in it:
 * each distinct reason becomes a time series.
 */
export function countTransactionRetry(reason: string): void {
  metrics.transactionRetries.inc({ reason });
}

/** Records how long a committed price-list import took (seconds). */
export function observePriceListImport(seconds: number): void {
  metrics.priceListImportDuration.observe(seconds);
}

/** How long a scrape waits for the database's figures. */
const databaseFiguresTimeoutMs = 2_000;
/** The reading under way: scrapes while the database hangs share it instead of queuing more. */
let readingFigures: Promise<void> | null = null;

async function readDatabaseFigures(): Promise<void> {
  const [backlog, alerts] = await Promise.all([
    outboxBacklog(),
    countOpenAlerts(),
  ]);
  metrics.outboxUnsent.set(backlog.unsent);
  metrics.outboxOldestAge.set(
    backlog.oldestUnsentAt
      ? Math.max(0, (Date.now() - backlog.oldestUnsentAt.getTime()) / 1000)
      : 0,
  );
  metrics.openAlerts.set(alerts);
}

/** Refreshes the database's figures, or leaves them out of this scrape when the database does not answer in time. */
async function refreshDatabaseFigures(): Promise<void> {
  const reading = (readingFigures ??= readDatabaseFigures().finally(() => {
    readingFigures = null;
  }));
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timedOut = new Promise<"timeout">((resolve) => {
    timer = setTimeout(() => resolve("timeout"), databaseFiguresTimeoutMs);
  });
  try {
    const outcome = await Promise.race([reading, timedOut]);
    if (outcome === "timeout") throw new Error("timed out");
    metrics.databaseFiguresUp.set(1);
  } catch {
    // Stale numbers would read as true ones: NaN says "not known now".
    metrics.outboxUnsent.set(Number.NaN);
    metrics.outboxOldestAge.set(Number.NaN);
    metrics.openAlerts.set(Number.NaN);
    metrics.databaseFiguresUp.set(0);
  } finally {
    clearTimeout(timer);
  }
}

/** The Content-Type of {@link metricsText}: Prometheus' text format 0.0.4. */
export const metricsContentType = metrics.registry.contentType;

/** Every metric in Prometheus' text format, the database's figures read just now. */
export async function metricsText(): Promise<string> {
  await refreshDatabaseFigures();
  return metrics.registry.metrics();
}
