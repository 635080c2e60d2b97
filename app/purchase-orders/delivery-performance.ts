/**
 * A supplier's delivery record over the last 12 months: how many order lines came on time
 * and how many in full. A line counts once it is finished: received in full (its
 * completed_at), or its order closed short while it was still open. Its finishing day must
 * lie in the window: after the same day a year ago, up to today.
 * - On time: completed on or before its expected day. A line its order closed short was
 *   never completed, so it is not on time.
 * - In full: received at least the ordered quantity. Closed short is not in full.
 * Pure: quantities in thousandths, the caller says what "today" is.
 */
import {
  addDays,
  addMonths,
  dayOf,
  type CalendarDate,
} from "~/lib/calendar-days";

export interface FinishedLine {
  expectedDate: CalendarDate;
  quantity: bigint;
  received: bigint;
  /** When the line was received in full; null when it never was. */
  completedAt: Date | null;
  /** When its order was closed short; null when it was not. */
  closedShortAt: Date | null;
}

export interface DeliveryPerformance {
  /** The first day after the window's start, and its last day (today). */
  from: CalendarDate;
  to: CalendarDate;
  lines: number;
  onTime: number;
  inFull: number;
  /** 0–1; null without a line in the window. */
  onTimeRate: number | null;
  inFullRate: number | null;
}

/** The window's first day: the day after the same day 12 months ago (3 Dec 2026 → 4 Dec 2025). */
export function performanceWindowStart(today: CalendarDate): CalendarDate {
  return addDays(addMonths(today, -12), 1);
}

export function deliveryPerformance(
  lines: readonly FinishedLine[],
  today: CalendarDate,
): DeliveryPerformance {
  const from = performanceWindowStart(today);
  let counted = 0;
  let onTime = 0;
  let inFull = 0;
  for (const line of lines) {
    const finished = line.completedAt ?? line.closedShortAt;
    if (!finished) continue;
    const day = dayOf(finished);
    if (day < from || day > today) continue;
    counted += 1;
    if (line.completedAt && dayOf(line.completedAt) <= line.expectedDate) {
      onTime += 1;
    }
    if (line.completedAt && line.received >= line.quantity) inFull += 1;
  }
  return {
    from,
    to: today,
    lines: counted,
    onTime,
    inFull,
    onTimeRate: counted === 0 ? null : onTime / counted,
    inFullRate: counted === 0 ? null : inFull / counted,
  };
}

/** "83 % (5 of 6 lines)"; the caller says "no deliveries" when there is no line. */
export function rateText(part: number, whole: number): string {
  const percent = Math.round((part / whole) * 100);
  return `${percent} % (${part} of ${whole} line${whole === 1 ? "" : "s"})`;
}
