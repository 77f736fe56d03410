/**
 * An API key is `kx<10 alphanumerics>.<secret>`: the part before the dot finds the row, the secret
 * is checked against its stored hash. A JWT has two dots, so the two never look alike.
 */
export const API_KEY_PATTERN = /^(kx[A-Za-z0-9]{10})\.([A-Za-z0-9_-]{32,64})$/;

export function parseApiKey(text: string): { prefix: string; secret: string } | undefined {
  const match = API_KEY_PATTERN.exec(text.trim());
  return match ? { prefix: match[1], secret: match[2] } : undefined;
}
