/**
 * Distributions of one or two statistics over a family, from the distribution engine
 * (src/enumerate), the same function `gradus dist` calls. Until it exists this reports
 * itself unavailable.
 */
import { InputError } from '../../core/errors.js';
import type { Poly } from '../../core/poly.js';
import type { Family, Params, Statistic } from '../../enumerate/plugin.js';

export const DISTRIBUTION_ENGINE_AVAILABLE = false;

export function distribution(_family: Family<unknown>, _params: Params, _s1: Statistic<unknown>, _s2?: Statistic<unknown>): Poly {
  throw new InputError('the distribution engine is not available in this build');
}
