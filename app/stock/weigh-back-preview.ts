/**
 * The spool weigh-back as a page shows it while the gross weight is typed: what an issue
 * takes from a spool is its previous net less its net now (gross now − tare, by
 * {@link spoolNetMassKg}), to the gram. The ledger computes the same again on exact
 * amounts when the issue is recorded. Pure.
 */
import { spoolNetMassKg } from "~/engineering/spool";
import { typedNumber } from "~/lib/number-text";

export interface WeighBackPreview {
  /** What the issue takes, kg, to the gram; zero or less when the spool weighs its net or more. */
  issueKg: number;
  /** What the spool holds now, kg: gross − tare. */
  netNowKg: number;
}

/**
 * The issue a weighed-back spool makes, from its net before (`previousNetKg`, the lot's
 * on hand), the gross weight typed now (a decimal comma allowed) and the spool's tare.
 * Null while the gross is no number, or is below the tare (the ledger refuses it).
 */
export function weighBackPreview(
  previousNetKg: number,
  grossText: string,
  tareKg: number,
): WeighBackPreview | null {
  const grossKg = typedNumber(grossText);
  if (grossKg === null || grossKg < 0 || grossKg < tareKg) return null;
  const netNowKg = spoolNetMassKg(grossKg, tareKg);
  return {
    issueKg: Math.round((previousNetKg - netNowKg) * 1000) / 1000,
    netNowKg,
  };
}
