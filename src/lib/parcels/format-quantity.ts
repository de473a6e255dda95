// Numbers as the portal and the letters print them: fixed decimals, thousands separated, unit always shown.

const grouped = (value: number, decimals: number) =>
  value.toLocaleString('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals, useGrouping: true });

/** A level or depth change, 2 decimals by default: "0.31 m". */
export function metres(value: number, decimals = 2): string {
  return `${grouped(Object.is(Math.round(value * 10 ** decimals), -0) ? 0 : value, decimals)} m`;
}

/** A distance along the river, whole metres: "1,020 m". */
export function distance(value: number): string {
  return `${grouped(value, 0)} m`;
}

/** A water or ground level above the datum of the survey: "34.40 m". */
export function level(value: number): string {
  return `${grouped(value, 2)} m`;
}

export function discharge(value: number): string {
  return `${grouped(value, 1)} m³/s`;
}
