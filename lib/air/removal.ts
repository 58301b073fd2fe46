/**
 * Minutes for ventilation to remove a fraction of airborne contaminants from an
 * empty, well-mixed room with no source: t = ln(1 / (1 − E)) / ACH × 60
 * (CDC 2003, Guidelines for Environmental Infection Control, Appendix B, Table B.1).
 *
 * Returns null when ACH ≤ 0: no air is changed, so removal never completes. null
 * rather than Infinity because Infinity turns into null in JSON anyway and prints
 * as "Infinity" in a template; null makes every caller say what to show.
 */
export function minutesToRemove(fraction: number, airChangesPerHour: number): number | null {
  if (!(fraction >= 0 && fraction < 1)) throw new RangeError(`removal fraction must be in [0, 1), got ${fraction}`);
  if (Number.isNaN(airChangesPerHour)) throw new RangeError("air changes per hour is NaN");
  if (airChangesPerHour <= 0) return null;
  return (Math.log(1 / (1 - fraction)) / airChangesPerHour) * 60;
}

export const REMOVAL_99 = 0.99;
export const REMOVAL_99_9 = 0.999;
