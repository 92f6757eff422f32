/**
 * Text made safe to put in an XML 1.0 document: every character XML 1.0 does
 * not allow becomes U+FFFD (the replacement character), so a name typed with a
 * stray control code still gives a file every XML parser reads.
 *
 * XML 1.0 (Fifth Edition), production [2] Char:
 *   #x9 | #xA | #xD | [#x20-#xD7FF] | [#xE000-#xFFFD] | [#x10000-#x10FFFF]
 * so out go U+0000-U+001F except tab, newline and CR, lone surrogates
 * (U+D800-U+DFFF not in a pair), and U+FFFE / U+FFFF.
 * Source: W3C, Extensible Markup Language (XML) 1.0 (Fifth Edition), section 2.2.
 *
 * Example: xmlText("a\u0000b\uFFFF") === "a\uFFFDb\uFFFD". Escaping of & < > " is
 * the writer's own job; this only removes what no escape can carry.
 */
export function xmlText(text: string): string {
  // the `u` flag makes a surrogate pair one code point, so only lone halves match
  return String(text).replace(/[^\u0009\u000A\u000D\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu, '\uFFFD');
}
