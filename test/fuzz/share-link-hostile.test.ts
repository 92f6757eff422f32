/**
 * Share links (`#design=<base64url JSON>`) under hostile input: the decoder and
 * the document check are pure functions, so they are tested here directly,
 * with fast-check property testing over arbitrary text and JSON. base64url as
 * RFC 4648 section 5 defines it, checked against Node's Buffer (a general-purpose
 * reference implementation). A link must never throw, never run code, never
 * reach a prototype, and never yield a design until parseDesign has accepted it
 * (the workbench keeps its current design otherwise: fw-app.openFromHash).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { decodeDesign, designFromHash, encodeDesign, shareUrl } from '../../viewer/lib/share-link.ts';
import { acceptedDocument } from './arbitraries.ts';
import { fuzzSeed } from './budget.ts';

const b64 = (text: string | Uint8Array) => Buffer.from(text as string).toString('base64url');

/** What the workbench does with a link: decode, then check; a design only when both pass. */
function openLink(hash: string): { design: unknown } | { message: string } | null {
  const encoded = designFromHash(hash);
  if (encoded === null) return null;
  const decoded = decodeDesign(encoded);
  if (!decoded.ok) return { message: decoded.message };
  const parsed = parseDesign(decoded.doc);
  if (!parsed.ok) return { message: parsed.errors.map((e) => `${e.field}: ${e.message}`).join(' ') };
  return { design: decoded.doc };
}

const HOSTILE_DOCS: { name: string; json: string; field: RegExp }[] = [
  { name: '__proto__ key', json: '{"__proto__":{"polluted":"yes"},"supply":{"headMax":"2 m"},"level":{"target":"40 mm"}}', field: /__proto__/ },
  { name: 'constructor.prototype', json: '{"constructor":{"prototype":{"polluted":"yes"}},"supply":{"headMax":"2 m"},"level":{"target":"40 mm"}}', field: /constructor/ },
  { name: 'nested __proto__', json: '{"supply":{"headMax":"2 m","__proto__":{"polluted":"yes"}},"level":{"target":"40 mm"}}', field: /supply\.__proto__/ },
  { name: 'script in a value', json: '{"supply":{"headMax":"<img src=x onerror=alert(1)>"},"level":{"target":"40 mm"}}', field: /supply\.headMax/ },
  { name: 'script in the name', json: `{"name":"${'<script>alert(1)</script>'.repeat(5)}","supply":{"headMax":"2 m"},"level":{"target":"40 mm"}}`, field: /name/ },
  { name: 'wrong types', json: '{"supply":"2 m","level":40}', field: /supply/ },
  { name: 'missing keys', json: '{}', field: /supply\.headMax/ },
  { name: 'extra keys', json: '{"supply":{"headMax":"2 m"},"level":{"target":"40 mm"},"run":"rm -rf /"}', field: /run/ },
  { name: '1e999 (Infinity)', json: '{"supply":{"headMax":1e999},"level":{"target":"40 mm"}}', field: /supply\.headMax/ },
  { name: '-0 target', json: '{"supply":{"headMax":"2 m"},"level":{"target":-0}}', field: /level\.target/ },
  { name: '1e308 target', json: '{"supply":{"headMax":"2 m"},"level":{"target":1e308}}', field: /level\.target/ },
  { name: 'junk number text', json: '{"supply":{"headMax":"2.2 m; DROP TABLE"},"level":{"target":"40 mm"}}', field: /supply\.headMax/ },
  { name: 'deeply nested', json: `{"supply":{"headMax":${'['.repeat(3000)}2${']'.repeat(3000)}},"level":{"target":"40 mm"}}`, field: /supply\.headMax/ },
  { name: 'a list', json: '[1,2,3]', field: /design/ },
  { name: 'a string', json: '"hello"', field: /design/ },
  { name: 'null', json: 'null', field: /design/ },
];

describe('share links with hostile designs: refused with the field named, nothing polluted', () => {
  it.each(HOSTILE_DOCS)('$name', ({ json, field }) => {
    const result = openLink(`#design=${b64(json)}`);
    expect(result).not.toBeNull();
    expect(result && 'message' in result).toBe(true);
    if (result && 'message' in result) {
      expect(result.message).toMatch(field);
      expect(result.message).not.toMatch(/\[object Object\]|undefined/);
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype).not.toHaveProperty('polluted');
  });

  it('damaged, oversized and non-UTF-8 links get a message, never an exception', () => {
    const cases = [
      '#design=not*a*design',
      '#design=%E0%A4%A',
      '#design=' + 'A'.repeat(30_000),
      '#design=' + b64(Uint8Array.from([0xff, 0xfe, 0x00, 0x80])),
      '#design=' + b64('{"supply":'),
      '#design=' + b64('NaN'),
      '#design=' + b64(''),
      '#design=a&design=b',
      '#design==',
      '#design=' + b64('{"supply":{"headMax":"2 m"},"level":{"target":"40 mm"}}') + '%00',
    ];
    for (const hash of cases) {
      const result = openLink(hash);
      expect(result, hash).not.toBeNull();
      expect(result && 'message' in result, hash).toBe(true);
    }
    expect(openLink('#other=1')).toBeNull();
    expect(openLink('')).toBeNull();
  });

  it('any text in the hash: decoding never throws and never yields an unchecked design (fast-check)', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.string({ unit: 'binary' }), fc.base64String(), fc.string({ unit: fc.constantFrom(...'ABCxyz019-_') })), (text) => {
        const result = openLink(`#design=${text}`);
        if (result && 'design' in result) expect(parseDesign(result.design).ok).toBe(true);
      }),
      { numRuns: 500, seed: fuzzSeed() },
    );
  });

  it('any JSON value in a link: decodes to the same value, and opens only when parseDesign accepts it (fast-check)', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 6 }), (value) => {
        const encoded = encodeDesign(value);
        expect(encoded).toBe(b64(JSON.stringify(value))); // RFC 4648 base64url, as Node's Buffer writes it
        const decoded = decodeDesign(encoded);
        if (encoded.length > 20_000) return expect(decoded.ok).toBe(false);
        expect(decoded).toEqual({ ok: true, doc: JSON.parse(JSON.stringify(value)) });
        const result = openLink(new URL(shareUrl('http://127.0.0.1:5173/', value)).hash);
        expect(result && 'design' in result).toBe(parseDesign(value).ok);
      }),
      { numRuns: 300, seed: fuzzSeed() },
    );
  });

  it('every accepted design survives the link round trip and opens (fast-check)', () => {
    fc.assert(
      fc.property(acceptedDocument(), (doc) => {
        const parsed = parseDesign(doc);
        fc.pre(parsed.ok);
        const result = openLink(new URL(shareUrl('http://127.0.0.1:5173/?x=1#old', doc)).hash);
        expect(result && 'design' in result && result.design).toEqual(doc);
      }),
      { numRuns: 200, seed: fuzzSeed() },
    );
  });
});
