import { describe, expect, test } from 'vitest';
import {
  COLLAPSE_DEFAULTS,
  FRESH_COLLAPSE_STATE,
  collapseStep,
  isCollapsed,
} from '../../src/search/collapse.js';

const settings = { ...COLLAPSE_DEFAULTS, patience: 3, stallPatience: 5, restartAfter: 2 };
const collapsedSignals = { distinctFraction: 0.01, meanEntropy: 0.001, improved: false };

describe('collapseStep', () => {
  test('isCollapsed() fires on few distinct graphs or on low entropy, not on a diverse batch', () => {
    expect(isCollapsed({ distinctFraction: 0.9, meanEntropy: 0.5, improved: false }, settings)).toBe(false);
    expect(isCollapsed({ distinctFraction: 0.05, meanEntropy: 0.5, improved: false }, settings)).toBe(true);
    expect(isCollapsed({ distinctFraction: 0.9, meanEntropy: 0.01, improved: false }, settings)).toBe(true);
  });

  test('collapseStep() waits `patience` stale collapsed iterations, perturbs, then restarts after restartAfter perturbations', () => {
    let state = FRESH_COLLAPSE_STATE;
    const actions: string[] = [];
    for (let i = 0; i < 6; i++) {
      const r = collapseStep(state, collapsedSignals, settings);
      actions.push(r.action);
      state = r.state;
    }
    expect(actions).toEqual(['none', 'none', 'perturb', 'none', 'none', 'restart']);
    expect(state.perturbations).toBe(1);
    expect(state.restarts).toBe(1);
  });

  test('collapseStep() acts on a long stall even when the batch is diverse', () => {
    let state = FRESH_COLLAPSE_STATE;
    const actions: string[] = [];
    for (let i = 0; i < 5; i++) {
      const r = collapseStep(state, { distinctFraction: 0.9, meanEntropy: 0.5, improved: false }, settings);
      expect(r.collapsed).toBe(false);
      actions.push(r.action);
      state = r.state;
    }
    expect(actions).toEqual(['none', 'none', 'none', 'none', 'perturb']);
  });

  test('collapseStep() does nothing while the best score improves, and resets its counters', () => {
    let state = { ...FRESH_COLLAPSE_STATE, staleIterations: 2, perturbationsSinceImprovement: 1 };
    const r = collapseStep(state, { ...collapsedSignals, improved: true }, settings);
    expect(r.action).toBe('none');
    state = r.state;
    expect(state.staleIterations).toBe(0);
    expect(state.perturbationsSinceImprovement).toBe(0);
  });
});
