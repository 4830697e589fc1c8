/**
 * The symmetric-function engine's entry points, for the command line, the terminal app and
 * the search: evaluate an expression, or call the pieces directly.
 */
export { evaluateExpression, DEFAULT_MAX_DEGREE, type SymResult } from './expression.js';
export { EXPRESSION_FUNCTIONS, type EvalOptions } from './expression-eval.js';
export { EXPRESSION_GRAMMAR, parseExpression } from './expression-parser.js';
export { SymFun, keyToPartition } from './symfun.js';
export { BASES, type Basis } from './transitions.js';
export { formatLatex, formatText, integralCoefficients } from './sym-format.js';
export { character, characterTable, classFunctionToSchur } from './characters.js';
export { kostkaMatrix, kostkaNumber, inverseKostkaMatrix } from './kostka.js';
export { fundamentalToSchur, compositionMask, maskComposition } from './quasisym.js';
export { modifiedMacdonald, modifiedMacdonaldSchur } from './macdonald.js';
export { kostkaFoulkes, modifiedHallLittlewood, charge } from './hall-littlewood.js';
export { nabla, delta, deltaPrime, deltaPrimeOfEn, starScalar, applyDiagonal } from './operators.js';
export { plethysmTimes, evaluateAtAlphabet } from './plethysm.js';
export { bigB, bigT, bigW, bigPi, bigM } from './cell-data.js';
