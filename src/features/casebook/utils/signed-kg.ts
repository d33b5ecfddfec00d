/** "+0.55 kg", "−0.45 kg", "0.00 kg": a charge to add, where the sign says add or recover. */
export function signedKg(kg: number): string {
  return `${kg > 0 ? "+" : kg < 0 ? "−" : ""}${Math.abs(kg).toFixed(2)} kg`;
}
