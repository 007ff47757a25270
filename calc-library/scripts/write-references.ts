/// <reference types="node" />
// Writes REFERENCES.md from the bibliography in src/references/bibliography.ts.
// Run with `npm run references -w calc-library`.
import { writeFileSync } from 'node:fs';
import { references } from '../src/references/bibliography.js';
import { renderReferencesMarkdown } from '../src/references/render-references-markdown.js';

writeFileSync(new URL('../REFERENCES.md', import.meta.url), renderReferencesMarkdown(references));
process.stdout.write(`REFERENCES.md: ${references.length} references\n`);
