/**
 * The browser tab title for a screen: "<name> · Pinwright".
 * Example: `screenTitle('Bench')` → "Bench · Pinwright"
 */
export function screenTitle(name: string): string {
  return `${name} · Pinwright`;
}
