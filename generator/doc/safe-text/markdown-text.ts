/**
 * Text a grower typed (a name, notes, a material name) made safe inside a
 * Markdown line or table cell: line breaks become spaces (so no newline can
 * start a heading, a list or a table row), and the characters Markdown gives a
 * meaning inside a line are escaped with a backslash: \ ` * _ [ ] < > | and a
 * "#" (a heading marker where a line might start). CommonMark allows a backslash
 * before any ASCII punctuation, and it shows as the character alone.
 *
 * Source: CommonMark Spec 0.31.2, section 2.4 (backslash escapes) and 4.2 (ATX headings).
 *
 * Example: markdownText("tub\n# gone *now*") === "tub \\# gone \\*now\\*".
 */
export function markdownText(text: string): string {
  return String(text)
    .replace(/\r\n|[\r\n\u0085\u2028\u2029]/g, ' ')
    .replace(/[\\`*_[\]<>|#]/g, (c) => `\\${c}`);
}
