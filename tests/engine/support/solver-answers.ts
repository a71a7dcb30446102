/**
 * Writes tests/engine/solver-answers.json: the answers of the inverse solvers, the analysis and
 * the case check for the requests of solver-cases.ts, as the engine gave them when this was run.
 * Run on purpose only (`npx tsx tests/engine/support/solver-answers.ts`): the test compares today's
 * engine with the answers stored here.
 */
import { writeFileSync } from 'node:fs';
import { answersOf } from './solver-cases';

const file = new URL('../solver-answers.json', import.meta.url);
writeFileSync(file, JSON.stringify(answersOf(), null, '\t') + '\n');
console.log(`wrote ${file.pathname}`);
