/**
 * The designed structure of the demo scenario, as data. The generator in scenario.ts reads
 * every parameter from here, so the truth a reader sees and the numbers in the demo file
 * cannot disagree.
 *
 * The scenario is invented: the Quennel Delta, a made-up river delta whose docks sell fuel
 * to barges and coasters. All prices are in one unnamed local currency. Every relation is
 * stated in natural logs of the prices.
 */

/** Integration order of a series: 0 = stationary in levels, 1 = stationary after one difference. */
export type IntegrationOrder = 0 | 1;

/** One column of the demo file and what the generator made it to be. */
export interface DemoSeriesTruth {
  /** Column name in the demo file. */
  name: string;
  /** What the series stands for in the scenario. */
  description: string;
  /** Price unit, for labels. */
  unit: string;
  /** Decimals written to the file; chosen so every value keeps at least 4 significant digits. */
  decimals: number;
  /** Price on the first row before noise (the centre of the series' first draw). */
  startPrice: number;
  integrationOrder: IntegrationOrder;
  /** How the generator builds the series, in one sentence. */
  construction: string;
  /** For an I(0) series: the mean and half-life of its log level, an AR(1) around the mean. */
  meanReversion?: { logMean: number; halfLifeDays: number; logSd: number };
}

/** A pair tied by a long-run relation: log dependent = intercept + beta * log regressor + spread. */
export interface DemoPairTruth {
  dependent: string;
  regressor: string;
  intercept: number;
  beta: number;
  /** Days for a spread deviation to halve: the spread is AR(1) with phi = 0.5^(1/halfLifeDays). */
  halfLifeDays: number;
  /** AR(1) coefficient of the spread, phi = 0.5^(1/halfLifeDays). */
  phi: number;
  /** Standard deviation of the spread in its stationary law (log points). */
  spreadSd: number;
  /**
   * Speed at which each series closes the gap, per day: the coefficient on the lagged spread
   * in that series' own log-change equation (the loading alpha of an error-correction model).
   */
  adjustment: Record<string, number>;
  /** One sentence on who moves when the spread is off. */
  story: string;
}

/** The leader/follower structure of the first pair, as a vector error-correction model. */
export interface DemoLeadLagTruth {
  leader: string;
  follower: string;
  /** Coefficient on the leader's lagged log change in the follower's log-change equation. */
  followerOnLaggedLeaderChange: number;
  /** Coefficient on the follower's lagged log change in the leader's equation (zero by design). */
  leaderOnLaggedFollowerChange: number;
  /** Share of the leader's same-day shock the follower takes at once (its beta: full pass-through). */
  sameDayPassThrough: number;
  /** Direction of Granger causality by design. */
  grangerCausality: string;
}

/** The whole designed structure of the demo data. */
export interface DemoTruth {
  setting: string;
  seed: number;
  /** First row's date (a Monday); rows are consecutive weekdays, no holidays. */
  startDate: string;
  rows: number;
  series: DemoSeriesTruth[];
  cointegratedPairs: DemoPairTruth[];
  leadLag: DemoLeadLagTruth;
  /** I(1) series tied to nothing else in the file. */
  unrelated: string[];
  /** I(0) series: mean-reverting in levels. */
  stationary: string[];
  /** What else holds, so a reader knows which relations the file must not show. */
  notes: string[];
}

/** AR(1) coefficient whose deviations halve in the given number of days. */
export function phiFromHalfLife(halfLifeDays: number): number {
  return Math.pow(0.5, 1 / halfLifeDays);
}

// Daily log-change parameters of the stochastic trends. Volatilities of 1.4-2.0% a day are
// ordinary for fuel and freight; drifts are small so the trends are visible but not the story.
/** GateGasoil (the leader): daily drift of its log price. */
export const GASOIL_DRIFT = 0.0001;
/** GateGasoil: daily volatility of its log price. */
export const GASOIL_SIGMA = 0.014;
/** Common trend of the HeavyFuel/BunkerBlend pair: daily drift. */
export const HEAVY_TREND_DRIFT = 0;
/** Common trend of the HeavyFuel/BunkerBlend pair: daily volatility. */
export const HEAVY_TREND_SIGMA = 0.016;
/** BargeFreight: daily drift of its log rate (about 8% a year). */
export const FREIGHT_DRIFT = 0.0003;
/** BargeFreight: daily volatility of its log rate. */
export const FREIGHT_SIGMA = 0.02;
/** Share of each HeavyFuel/BunkerBlend spread correction borne by HeavyFuel (the rest by BunkerBlend). */
export const HEAVY_FUEL_SHARE = 0.4;
/** TankPremium: half-life in days of its log deviation from the mean. */
export const PREMIUM_HALF_LIFE = 6;
/** TankPremium: stationary standard deviation of its log deviation from the mean. */
export const PREMIUM_SD = 0.15;

const DIESEL_INTERCEPT = 0.4;
const DIESEL_BETA = 1.1;
const DIESEL_HALF_LIFE = 12;
const DIESEL_PHI = phiFromHalfLife(DIESEL_HALF_LIFE);
const BUNKER_INTERCEPT = 0.85;
const BUNKER_BETA = 0.9;
const BUNKER_HALF_LIFE = 30;
const BUNKER_PHI = phiFromHalfLife(BUNKER_HALF_LIFE);

/** The designed structure of the Quennel Delta demo file. */
export const DEMO_TRUTH: DemoTruth = {
  setting:
    'The Quennel Delta, an invented river delta: a refinery upstream sells gasoil at its gate, ' +
    'the delta docks resell diesel to boats, a residual-fuel market feeds a marine bunker blend, ' +
    'barges carry cargo upriver, and the dock terminal rents tank space.',
  seed: 91,
  startDate: '2022-01-03',
  rows: 780,
  series: [
    {
      name: 'GateGasoil',
      description: 'Gasoil at the refinery gate',
      unit: 'per litre',
      decimals: 4,
      startPrice: 1.4,
      integrationOrder: 1,
      construction: 'Random walk with drift in logs; it leads DockDiesel and ignores it.',
    },
    {
      name: 'DockDiesel',
      description: 'Diesel sold to boats at the delta docks',
      unit: 'per litre',
      decimals: 4,
      startPrice: Math.exp(DIESEL_INTERCEPT + DIESEL_BETA * Math.log(1.4)),
      integrationOrder: 1,
      construction: 'Follows GateGasoil through an error-correction equation (see leadLag and scenario.ts).',
    },
    {
      name: 'HeavyFuel',
      description: 'Residual fuel oil at the delta terminal',
      unit: 'per tonne',
      decimals: 2,
      startPrice: 480,
      integrationOrder: 1,
      construction: `Common random-walk trend of its pair, minus ${HEAVY_FUEL_SHARE}/${BUNKER_BETA} of the pair spread.`,
    },
    {
      name: 'BunkerBlend',
      description: 'Marine bunker blend sold at the delta anchorage',
      unit: 'per tonne',
      decimals: 2,
      startPrice: Math.exp(BUNKER_INTERCEPT + BUNKER_BETA * Math.log(480)),
      integrationOrder: 1,
      construction: `${BUNKER_INTERCEPT} + ${BUNKER_BETA} times the common trend, plus ${1 - HEAVY_FUEL_SHARE} of the pair spread.`,
    },
    {
      name: 'BargeFreight',
      description: 'Barge freight rate for the upriver leg',
      unit: 'per tonne',
      decimals: 2,
      startPrice: 38.5,
      integrationOrder: 1,
      construction: 'Independent random walk with drift in logs; tied to nothing.',
    },
    {
      name: 'TankPremium',
      description: 'Monthly premium for tank storage at the dock terminal',
      unit: 'per tonne per month',
      decimals: 3,
      startPrice: 6,
      integrationOrder: 0,
      construction: `AR(1) in logs around log 6.00, half-life ${PREMIUM_HALF_LIFE} days, independent of the rest.`,
      meanReversion: { logMean: Math.log(6), halfLifeDays: PREMIUM_HALF_LIFE, logSd: PREMIUM_SD },
    },
  ],
  cointegratedPairs: [
    {
      dependent: 'DockDiesel',
      regressor: 'GateGasoil',
      intercept: DIESEL_INTERCEPT,
      beta: DIESEL_BETA,
      halfLifeDays: DIESEL_HALF_LIFE,
      phi: DIESEL_PHI,
      spreadSd: 0.03,
      adjustment: { DockDiesel: DIESEL_PHI - 1, GateGasoil: 0 },
      story: `A tight pair: the docks price diesel off the refinery gate and halve a gap in ${DIESEL_HALF_LIFE} days; only DockDiesel moves to close it.`,
    },
    {
      dependent: 'BunkerBlend',
      regressor: 'HeavyFuel',
      intercept: BUNKER_INTERCEPT,
      beta: BUNKER_BETA,
      halfLifeDays: BUNKER_HALF_LIFE,
      phi: BUNKER_PHI,
      spreadSd: 0.04,
      // Each series' loading follows from how the spread is split between them (scenario.ts).
      adjustment: {
        BunkerBlend: (1 - HEAVY_FUEL_SHARE) * (BUNKER_PHI - 1),
        HeavyFuel: -(HEAVY_FUEL_SHARE / BUNKER_BETA) * (BUNKER_PHI - 1),
      },
      story:
        `A loose pair: blenders and residual sellers drift apart for weeks (half-life ${BUNKER_HALF_LIFE} days) and both sides move back, ` +
        'each so slowly that three years cannot tell which moves more; no leader.',
    },
  ],
  leadLag: {
    leader: 'GateGasoil',
    follower: 'DockDiesel',
    followerOnLaggedLeaderChange: 0.4,
    leaderOnLaggedFollowerChange: 0,
    // Must equal the pair's beta: only then is the spread an exact AR(1) (see scenario.ts).
    sameDayPassThrough: DIESEL_BETA,
    grangerCausality: 'GateGasoil Granger-causes DockDiesel; DockDiesel does not Granger-cause GateGasoil.',
  },
  unrelated: ['BargeFreight'],
  stationary: ['TankPremium'],
  notes: [
    'The two pairs are driven by independent trends: no series of one pair is cointegrated with a series of the other.',
    'BargeFreight and TankPremium draw their own shocks; their changes are uncorrelated with everything else by design.',
    'Prices are rounded to the decimals above; the rounding moves a log price by under 0.0004, far below any spread.',
    'In this one sample the loose pair is found at the 5% level but not at 1%, and its estimated half-life comes out shorter than 30 days, as AR(1) estimates from three years of data tend to.',
    'The seed was chosen so that this one sample shows the designed structure clearly at the 5% level; other seeds give other samples of the same truth.',
  ],
};
