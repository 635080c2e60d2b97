/**
 * How a value axis writes large numbers so its labels stay short: in thousands from
 * 10,000, in millions from 10,000,000 (the unit says which). Pure.
 */
export interface AxisUnits {
  /** What each tick value is divided by. */
  divisor: number;
  /** Words before the unit: "", "thousand ", "million ". */
  prefix: string;
  /** Decimals on the ticks. */
  decimals: number;
}

export function axisUnits(highest: number): AxisUnits {
  const largest = Math.abs(highest);
  if (largest >= 10_000_000)
    return { divisor: 1_000_000, prefix: "million ", decimals: 0 };
  if (largest >= 10_000)
    return { divisor: 1_000, prefix: "thousand ", decimals: 0 };
  return { divisor: 1, prefix: "", decimals: largest >= 10 ? 0 : 2 };
}
