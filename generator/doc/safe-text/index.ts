/** Text that leaves the program, made safe where it lands (XML, Markdown, a terminal), and names compared as people read them. */
export { xmlText } from './xml-text.ts';
export { terminalText } from './terminal-text.ts';
export { markdownText } from './markdown-text.ts';
export { cleanName, nameKey } from './name-key.ts';
