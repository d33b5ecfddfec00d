/**
 * The text with its first letter made upper-case, for a phrase that begins a sentence
 * ("nearly full: …" → "Nearly full: …"). An empty text stays empty.
 *
 * @example upperFirst("rooftop unit") // "Rooftop unit"
 */
export function upperFirst(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
