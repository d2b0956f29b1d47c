// Writes docs/calculation-kinds.md from the built engine's schemas.
import { writeFileSync } from 'node:fs';
import { kindsMarkdown } from '../dist/index.js';

const target = new URL('../../../docs/calculation-kinds.md', import.meta.url);
writeFileSync(target, kindsMarkdown());
console.log(`wrote ${target.pathname}`);
