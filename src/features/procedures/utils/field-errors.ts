/** Messages for a field and everything under it ("supplyVolts" also shows "supplyVolts.1"). */
export function errorFor(errors: Record<string, string>, path: string): string | undefined {
  if (errors[path]) return errors[path];
  const nested = Object.keys(errors).find((key) => key.startsWith(`${path}.`));
  return nested ? errors[nested] : undefined;
}
