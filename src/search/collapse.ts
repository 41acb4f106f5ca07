/**
 * Watching for collapse and answering it.
 *
 * The plain cross-entropy method stalls: the policy becomes deterministic, every graph of the
 * batch is the same near miss, and the elite it trains on is that graph again. We watch two
 * signals each iteration: the fraction of distinct graphs among the batch's fresh samples and the
 * policy's mean decision entropy. When either is below its floor and the best score has not
 * improved for `patience` iterations (or, collapsed or not, for `stallPatience` iterations),
 * the policy is perturbed (Gaussian noise on the kernels,
 * Adam's moments reset); after `restartAfter` perturbations without improvement it is restarted
 * from fresh weights. The carried-over pool is kept either way, so what was found is not lost
 * and the restarted policy is trained on it at once. (The same escalation from small to large
 * moves is the idea of variable neighbourhood search: N. Mladenović, P. Hansen, "Variable
 * neighborhood search", Computers & Operations Research 24 (1997) 1097-1100.)
 */

export interface CollapseSettings {
  /** Collapse when fewer than this fraction of fresh samples are distinct. */
  readonly minDistinctFraction: number;
  /** ... or when the mean decision entropy (bits) falls below this. */
  readonly minEntropy: number;
  /** Iterations without improvement of the best score, while collapsed, before acting. */
  readonly patience: number;
  /**
   * Iterations without improvement before acting even when not collapsed: a policy that keeps
   * sampling variations of one local optimum (diverse enough to pass both floors) is stuck too.
   */
  readonly stallPatience: number;
  /** Noise scale of a perturbation, relative to each layer's Glorot limit. */
  readonly perturbScale: number;
  /** Perturbations without improvement before a restart. */
  readonly restartAfter: number;
}

export const COLLAPSE_DEFAULTS: CollapseSettings = {
  minDistinctFraction: 0.2,
  minEntropy: 0.05,
  patience: 10,
  stallPatience: 40,
  perturbScale: 0.5,
  restartAfter: 3,
};

export interface CollapseState {
  /** Iterations since the best score last improved. */
  readonly staleIterations: number;
  /** Perturbations since the best score last improved. */
  readonly perturbationsSinceImprovement: number;
  /** Totals over the run, for the log and the progress line. */
  readonly perturbations: number;
  readonly restarts: number;
  /**
   * Iterations left in which the elite is chosen among fresh samples only (the carried pool is
   * still kept and ranked for the pool and best list). Set after a perturbation or restart: a
   * pool-dominated elite would teach the new policy the old optimum again at once.
   */
  readonly freshOnly: number;
}

export const FRESH_COLLAPSE_STATE: CollapseState = {
  staleIterations: 0,
  perturbationsSinceImprovement: 0,
  perturbations: 0,
  restarts: 0,
  freshOnly: 0,
};

export type CollapseAction = 'none' | 'perturb' | 'restart';

export interface CollapseSignals {
  readonly distinctFraction: number;
  readonly meanEntropy: number;
  readonly improved: boolean;
}

/** Whether the signals say the policy has collapsed. */
export function isCollapsed(signals: CollapseSignals, settings: CollapseSettings): boolean {
  return signals.distinctFraction < settings.minDistinctFraction || signals.meanEntropy < settings.minEntropy;
}

/** The next state and what to do to the policy now. */
export function collapseStep(
  state: CollapseState,
  signals: CollapseSignals,
  settings: CollapseSettings,
): { state: CollapseState; action: CollapseAction; collapsed: boolean } {
  const collapsed = isCollapsed(signals, settings);
  const freshOnly = Math.max(0, state.freshOnly - 1);
  if (signals.improved) {
    return {
      state: { ...state, staleIterations: 0, perturbationsSinceImprovement: 0, freshOnly },
      action: 'none',
      collapsed,
    };
  }
  const stale = state.staleIterations + 1;
  const due = (collapsed && stale >= settings.patience) || stale >= settings.stallPatience;
  if (!due) {
    return { state: { ...state, staleIterations: stale, freshOnly }, action: 'none', collapsed };
  }
  if (state.perturbationsSinceImprovement + 1 >= settings.restartAfter) {
    return {
      state: {
        staleIterations: 0,
        perturbationsSinceImprovement: 0,
        perturbations: state.perturbations,
        restarts: state.restarts + 1,
        freshOnly: settings.patience,
      },
      action: 'restart',
      collapsed,
    };
  }
  return {
    state: {
      staleIterations: 0,
      perturbationsSinceImprovement: state.perturbationsSinceImprovement + 1,
      perturbations: state.perturbations + 1,
      restarts: state.restarts,
      freshOnly: settings.patience,
    },
    action: 'perturb',
    collapsed,
  };
}
