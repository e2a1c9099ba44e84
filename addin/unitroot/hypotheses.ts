/** The null and alternative hypotheses of unit-root and stationarity tests, in words. */
import type { Deterministic } from '../result';

export function unitRootHypotheses(name: string, d: Deterministic): { nullHypothesis: string; alternative: string } {
  const around = d === 'none' ? 'around zero' : d === 'const' ? 'around a constant level' : 'around a linear trend';
  return {
    nullHypothesis: `${name} has a unit root: shocks to it never fade`,
    alternative: `${name} is stationary ${around}`,
  };
}

export function stationarityHypotheses(name: string, d: 'const' | 'trend'): { nullHypothesis: string; alternative: string } {
  const around = d === 'const' ? 'around a constant level' : 'around a linear trend';
  return {
    nullHypothesis: `${name} is stationary ${around}`,
    alternative: `${name} has a unit root`,
  };
}
