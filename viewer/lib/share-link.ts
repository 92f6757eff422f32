/**
 * Share links: the design document as base64url JSON in the page address
 * (`#design=...`). Decoding never trusts the link: the caller validates the
 * document with parseDesign before using it.
 */
export const HASH_KEY = 'design';
export const UNITS_KEY = 'units';
const MAX_LINK_CHARS = 20_000;

export function encodeDesign(doc: unknown): string {
  const bytes = new TextEncoder().encode(JSON.stringify(doc));
  let binary = '';
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

export type DecodeResult = { ok: true; doc: unknown } | { ok: false; message: string };

export function decodeDesign(text: string): DecodeResult {
  if (text.length > MAX_LINK_CHARS) return { ok: false, message: `the link is ${text.length} characters long; a design link is at most ${MAX_LINK_CHARS}.` };
  if (!/^[A-Za-z0-9_-]*$/.test(text)) return { ok: false, message: 'the link is damaged: it holds characters a design link never has.' };
  let json: string;
  try {
    const binary = atob(text.replace(/-/g, '+').replace(/_/g, '/') + '='.repeat((4 - (text.length % 4)) % 4));
    json = new TextDecoder('utf-8', { fatal: true }).decode(Uint8Array.from(binary, (c) => c.charCodeAt(0)));
  } catch {
    return { ok: false, message: 'the link is damaged: its design part does not decode.' };
  }
  try {
    return { ok: true, doc: JSON.parse(json) };
  } catch {
    return { ok: false, message: 'the link is damaged: its design is not readable JSON.' };
  }
}

/** The encoded design in a location hash ("#design=..."), or null when the hash holds none. */
export function designFromHash(hash: string): string | null {
  const params = new URLSearchParams(hash.replace(/^#/, ''));
  return params.get(HASH_KEY);
}

/** The link to a design; with `units`, it opens in that system ("&units=imperial"; metric is the default). */
export function shareUrl(base: string, doc: unknown, units?: 'metric' | 'imperial'): string {
  return `${base.split('#')[0]}#${HASH_KEY}=${encodeDesign(doc)}${units === 'imperial' ? `&${UNITS_KEY}=imperial` : ''}`;
}

/** The unit system a link was made in, or null when it names none (links made before it did). */
export function unitsFromHash(hash: string): 'metric' | 'imperial' | null {
  const value = new URLSearchParams(hash.replace(/^#/, '')).get(UNITS_KEY);
  return value === 'imperial' || value === 'metric' ? value : null;
}
