/**
 * The three blocks of columns behind Johansen's reduced-rank regression, for one of the
 * five deterministic cases (Johansen 1988, 1991; Johansen 1995, ch. 5-6, chapters from
 * memory):
 *
 *   changes     Δx_t                                     (m columns)
 *   levels      x_{t-1}, plus 1 or t when the case puts a constant or a trend inside
 *               the long-run relations                 (m or m + 1 columns)
 *   short-run   Δx_{t-1}, ..., Δx_{t-K}, plus the unrestricted deterministic terms
 *
 * Sample: with T rows of data and K lagged changes the regression uses t = K+1 .. T-1
 * (0-based rows), so n = T - K - 1 observations, the reference library's count.
 * The trend is 1, 2, ..., n over that sample; where it appears a constant appears in the
 * short-run block too, so the statistics do not depend on where the trend starts.
 */
import type { JohansenCase } from './deterministic-case';

/** Which terms go where, by case. */
interface CaseTerms {
  /** Extra column in the levels block (inside the relations), if any. */
  inRelation: 'constant' | 'trend' | null;
  /** Unrestricted deterministic columns in the short-run block. */
  unrestricted: ('constant' | 'trend')[];
}

const TERMS: Record<JohansenCase, CaseTerms> = {
  none: { inRelation: null, unrestricted: [] },
  'restricted-constant': { inRelation: 'constant', unrestricted: [] },
  constant: { inRelation: null, unrestricted: ['constant'] },
  'restricted-trend': { inRelation: 'trend', unrestricted: ['constant'] },
  trend: { inRelation: null, unrestricted: ['constant', 'trend'] },
};

/** The columns of the regression, each of length nobs, with a name for messages. */
export interface JohansenDesign {
  nobs: number;
  changes: Float64Array[];
  /** The series' names, one per change column. */
  changeNames: string[];
  levels: Float64Array[];
  shortRun: Float64Array[];
  levelNames: string[];
  shortRunNames: string[];
  /** The deterministic term inside the relations (the last levels column), if any. */
  inRelation: 'constant' | 'trend' | null;
  /** How many unrestricted deterministic columns the short-run block holds. */
  unrestrictedCount: number;
}

/** The deterministic term the case places inside the long-run relations, if any. */
export function termInRelation(caseName: JohansenCase): 'constant' | 'trend' | null {
  return TERMS[caseName].inRelation;
}

/** How many unrestricted deterministic columns the case adds to the short-run block. */
export function unrestrictedTermCount(caseName: JohansenCase): number {
  return TERMS[caseName].unrestricted.length;
}

/**
 * Builds the three blocks for the series (each of length T, already checked), K lagged
 * changes and the case. Pure; no checks beyond what the caller did.
 */
export function johansenDesign(block: readonly ArrayLike<number>[], lags: number, caseName: JohansenCase, names: readonly string[]): JohansenDesign {
  const m = block.length;
  const T = block[0].length;
  const n = T - lags - 1;
  const terms = TERMS[caseName];

  const deterministic = (term: 'constant' | 'trend'): Float64Array => {
    const col = new Float64Array(n);
    for (let i = 0; i < n; i++) col[i] = term === 'constant' ? 1 : i + 1;
    return col;
  };

  // Each series column is a window onto one array per series (no copies): with
  // d[u] = x[u+1] - x[u], row i (data row t = K + 1 + i) has Δx_t = d[K + i],
  // Δx_{t-j} = d[K + i - j] and x_{t-1} = x[K + i].
  const diffs = block.map((x) => {
    const d = new Float64Array(T - 1);
    for (let u = 0; u < T - 1; u++) d[u] = x[u + 1] - x[u];
    return d;
  });
  const changes: Float64Array[] = diffs.map((d) => d.subarray(lags, lags + n));
  const levels: Float64Array[] = block.map((x) => Float64Array.from(x as ArrayLike<number>).subarray(lags, lags + n));
  const levelNames = names.map((name) => `the level of '${name}'`);
  if (terms.inRelation !== null) {
    levels.push(deterministic(terms.inRelation));
    levelNames.push(`the ${terms.inRelation} inside the relations`);
  }

  const shortRun: Float64Array[] = [];
  const shortRunNames: string[] = [];
  for (let j = 1; j <= lags; j++) {
    for (let s = 0; s < m; s++) {
      shortRun.push(diffs[s].subarray(lags - j, lags - j + n));
      shortRunNames.push(`the change of '${names[s]}' lagged ${j}`);
    }
  }
  for (const term of terms.unrestricted) {
    shortRun.push(deterministic(term));
    shortRunNames.push(`the unrestricted ${term}`);
  }

  return {
    nobs: n,
    changes,
    changeNames: [...names],
    levels,
    shortRun,
    levelNames,
    shortRunNames,
    inRelation: terms.inRelation,
    unrestrictedCount: terms.unrestricted.length,
  };
}
