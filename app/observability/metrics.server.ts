/**
 * The server's metrics, read by Prometheus from GET /metrics (server/app.ts,
 * docs/decisions/025-metrics.md). One registry per process, kept across the
 * dev server's module reloads so a metric is never registered twice.
 *
 * What the rest of the app calls:
 * - `observeRequest` (server/app.ts, once per answered request);
 * - `countTransactionRetry(reason)` (the transaction retry helper);
 * - `timePriceListImport(work)` (the price-list commit);
 * - `metricsText()` (the /metrics answer).
 */
import {
  Counter,
  Histogram,
  Registry,
  collectDefaultMetrics,
} from "prom-client";

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
    help: "Database transactions run again after a conflict, by reason (deadlock, lock wait timeout, certification failure, …).",
    labelNames: ["reason"] as const,
    registers: [registry],
  });
  const priceListImportDuration = new Histogram({
    name: "turnledger_price_list_import_duration_seconds",
    help: "Time to commit a price list's rows to the catalogue (successful or refused).",
    buckets: [0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10, 30, 60],
    registers: [registry],
  });
  return {
    registry,
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

/** Runs a price-list commit and records how long it took, whether it succeeded or threw. */
export async function timePriceListImport<T>(
  work: () => Promise<T>,
): Promise<T> {
  const stop = metrics.priceListImportDuration.startTimer();
  try {
    return await work();
  } finally {
    stop();
  }
}

/** The Content-Type of {@link metricsText}: Prometheus' text format 0.0.4. */
export const metricsContentType = metrics.registry.contentType;

/** Every metric in Prometheus' text format. */
export function metricsText(): Promise<string> {
  return metrics.registry.metrics();
}
