/**
 * Share links: base64url as RFC 4648 section 5 defines it, checked against
 * Node's Buffer 'base64url' encoding (a general-purpose reference implementation).
 */
import { describe, expect, it } from 'vitest';
import { decodeDesign, designFromHash, encodeDesign, shareUrl } from '../../viewer/lib/share-link.ts';

const doc = { name: 'Tomatenrinne 3 – süd', supply: { headMax: '2.2 m' }, level: { target: '45 mm' } };

describe('share link', () => {
  it('encodes as RFC 4648 base64url (same as Node Buffer)', () => {
    expect(encodeDesign(doc)).toBe(Buffer.from(JSON.stringify(doc), 'utf8').toString('base64url'));
  });
  it('round-trips a design with non-ASCII text', () => {
    expect(decodeDesign(encodeDesign(doc))).toEqual({ ok: true, doc });
  });
  it('puts the design in the hash and reads it back', () => {
    const url = shareUrl('http://127.0.0.1:5173/?x=1#old', doc);
    expect(url.startsWith('http://127.0.0.1:5173/?x=1#design=')).toBe(true);
    expect(designFromHash(new URL(url).hash)).toBe(encodeDesign(doc));
    expect(designFromHash('#other=1')).toBeNull();
  });
  it('says what is wrong with a bad link', () => {
    const bad = (t: string) => {
      const r = decodeDesign(t);
      return r.ok ? 'ok' : r.message;
    };
    expect(bad('not*a*design')).toMatch(/characters/);
    expect(bad(Buffer.from('{"supply":', 'utf8').toString('base64url'))).toMatch(/not readable JSON/);
    expect(bad(Buffer.from([0xff, 0xfe, 0xfd]).toString('base64url'))).toMatch(/does not decode/);
    expect(bad('A'.repeat(30_000))).toMatch(/at most/);
  });
});
