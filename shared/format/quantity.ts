/** A value with its unit, a space apart as SI writes it ("180 ms", "35 °C"); no value reads "—". */
export function formatQuantity(value: number | null | undefined, unit: string): string {
  if (value === null || value === undefined) return '—';
  return `${value} ${unit}`;
}
