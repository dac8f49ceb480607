/** Now, or the time SOURCE_DATE_EPOCH names (seconds since 1970) for a fully reproducible report. */
export function generationTime(): string {
  const epoch = process.env['SOURCE_DATE_EPOCH'];
  if (epoch !== undefined && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString();
  return new Date().toISOString();
}
