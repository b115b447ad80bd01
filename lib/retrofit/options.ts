/** Evaluation options; resolved once at the entry so the loops see a complete object. */
export interface EvaluateOptions {
  /** Warm-up length of each mode, s (default 3600: an hour). */
  warmupS?: number;
  /** Intervals per warm-up curve (default 120, i.e. 121 points: 30 s steps over an hour, enough for charts and limit times). */
  warmupIntervals?: number;
  /** Headroom that counts as "within budget", K (default 10, PRODUCT.md). */
  marginK?: number;
  /** Fixed-point tolerance on the junction temperature, K (default 0.01) and cap on iterations (default 50). */
  toleranceK?: number;
  maxIterations?: number;
  /** Skip the inverse problems ("what it takes"): they cost the most solves (default false). */
  skipWhatItTakes?: boolean;
  /** Skip the warm-up curves (default false). */
  skipWarmup?: boolean;
}

export type ResolvedOptions = Required<EvaluateOptions>;

export function resolveOptions(o: EvaluateOptions = {}): ResolvedOptions {
  return {
    warmupS: o.warmupS ?? 3600,
    warmupIntervals: o.warmupIntervals ?? 120,
    marginK: o.marginK ?? 10,
    toleranceK: o.toleranceK ?? 0.01,
    maxIterations: o.maxIterations ?? 50,
    skipWhatItTakes: o.skipWhatItTakes ?? false,
    skipWarmup: o.skipWarmup ?? false,
  };
}
