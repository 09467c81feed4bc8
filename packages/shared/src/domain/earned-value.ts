/**
 * Earned-value measures for a job, all money in integer minor units. Indices are plain ratios
 * (CPI 0.8 = 80p of work earned per £1 spent); null where the divisor is zero.
 */
import { roundHalfUp } from './money';

/** BAC budget at completion, PV planned value, EV earned value, AC actual cost: all minor units. */
export interface EarnedValueInput {
  bacMinor: number;
  pvMinor: number;
  evMinor: number;
  acMinor: number;
}

/** The three estimate-at-completion formulas. */
export type EacMethod = 'cpi' | 'budget-rate' | 'cpi-spi';

/** One estimate at completion with its ETC = EAC − AC and VAC = BAC − EAC, minor units. */
export interface CompletionEstimate {
  method: EacMethod;
  eacMinor: number;
  etcMinor: number;
  vacMinor: number;
}

/** Cost variance CV = EV − AC (negative = over cost). */
export function costVarianceMinor({ evMinor, acMinor }: EarnedValueInput): number {
  return evMinor - acMinor;
}

/** Schedule variance SV = EV − PV (negative = behind plan). */
export function scheduleVarianceMinor({ evMinor, pvMinor }: EarnedValueInput): number {
  return evMinor - pvMinor;
}

/** Cost performance index CPI = EV / AC; null when AC is 0. */
export function costPerformanceIndex({ evMinor, acMinor }: EarnedValueInput): number | null {
  return acMinor === 0 ? null : evMinor / acMinor;
}

/** Schedule performance index SPI = EV / PV; null when PV is 0. */
export function schedulePerformanceIndex({ evMinor, pvMinor }: EarnedValueInput): number | null {
  return pvMinor === 0 ? null : evMinor / pvMinor;
}

/**
 * Estimate at completion in minor units, rounded half away from zero, by method:
 * 'cpi' = BAC / CPI = BAC·AC/EV (null when EV or AC is 0);
 * 'budget-rate' = AC + (BAC − EV) (remaining work at budgeted cost);
 * 'cpi-spi' = AC + (BAC − EV) / (CPI·SPI) = AC + (BAC − EV)·AC·PV/EV² (null when EV, AC or PV is 0).
 * Computed from the integer inputs, not from rounded indices.
 */
export function estimateAtCompletionMinor(input: EarnedValueInput, method: EacMethod): number | null {
  const { bacMinor: bac, pvMinor: pv, evMinor: ev, acMinor: ac } = input;
  if (method === 'budget-rate') return ac + (bac - ev);
  if (method === 'cpi') return ev === 0 || ac === 0 ? null : roundHalfUp(BigInt(bac) * BigInt(ac), BigInt(ev));
  if (ev === 0 || ac === 0 || pv === 0) return null;
  return ac + roundHalfUp(BigInt(bac - ev) * BigInt(ac) * BigInt(pv), BigInt(ev) * BigInt(ev));
}

/** EAC, ETC and VAC for each method whose EAC is defined, in the order cpi, budget-rate, cpi-spi. */
export function completionEstimates(input: EarnedValueInput): CompletionEstimate[] {
  const methods: EacMethod[] = ['cpi', 'budget-rate', 'cpi-spi'];
  return methods.flatMap((method) => {
    const eacMinor = estimateAtCompletionMinor(input, method);
    if (eacMinor === null) return [];
    return [{ method, eacMinor, etcMinor: eacMinor - input.acMinor, vacMinor: input.bacMinor - eacMinor }];
  });
}
