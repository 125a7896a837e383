/** Batch evaluation of onset cases (command line and POST /api/batch/evaluate). */
export { evaluateCase } from './evaluate-case';
