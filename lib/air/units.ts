// The one place for unit conversion. The international foot is 0.3048 m exactly
// (1959 international yard and pound agreement), so every constant below is exact.

export const METRES_PER_FOOT = 0.3048;
export const SQUARE_METRES_PER_SQUARE_FOOT = 0.09290304; // 0.3048²
export const CUBIC_METRES_PER_CUBIC_FOOT = 0.028316846592; // 0.3048³
/** 1 cfm = 0.028316846592 m³/min = 28.316846592 L/min = 0.4719474432 L/s exactly. */
export const LITRES_PER_SECOND_PER_CFM = 0.4719474432;

export function feetToMetres(ft: number): number {
  return ft * METRES_PER_FOOT;
}

export function metresToFeet(m: number): number {
  return m / METRES_PER_FOOT;
}

export function squareFeetToSquareMetres(ft2: number): number {
  return ft2 * SQUARE_METRES_PER_SQUARE_FOOT;
}

export function squareMetresToSquareFeet(m2: number): number {
  return m2 / SQUARE_METRES_PER_SQUARE_FOOT;
}

export function cubicFeetToCubicMetres(ft3: number): number {
  return ft3 * CUBIC_METRES_PER_CUBIC_FOOT;
}

export function cubicMetresToCubicFeet(m3: number): number {
  return m3 / CUBIC_METRES_PER_CUBIC_FOOT;
}

export function cfmToLitresPerSecond(cfm: number): number {
  return cfm * LITRES_PER_SECOND_PER_CFM;
}

export function litresPerSecondToCfm(lps: number): number {
  return lps / LITRES_PER_SECOND_PER_CFM;
}
