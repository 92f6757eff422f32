/**
 * Text made safe to print on a terminal: control characters (C0 except tab and
 * newline, DEL, C1) are dropped, so a name holding an escape sequence cannot
 * move the cursor, change colours or set the window title. Bidirectional
 * overrides (U+202A-U+202E, U+2066-U+2069) go too: they make printed text read
 * in another order than it is stored.
 *
 * Source: ECMA-48 (5th edition, 1991), section 5: C0 set 00-1F, DEL 7F, C1 set
 * 80-9F; Unicode UAX #9 for the explicit directional formatting characters.
 *
 * Example: terminalText("ok\u001b[2Jgone") === "ok[2Jgone" (the ESC is gone, the
 * rest is harmless text).
 */
export function terminalText(text: string): string {
  return String(text).replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/g, '');
}
