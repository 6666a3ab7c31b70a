import { describe, expect, it } from 'vitest'
import {
  combineCqc,
  combineSrss,
  cqcCorrelation,
  cqcCorrelationEqual,
  cqcMatrix,
} from '@/engine/cqc'

describe('cqcCorrelationEqual', () => {
  it('matches the equal-damping coefficient table', () => {
    // METHODS.md §3 check values (derived), Der Kiureghian (1981) equal-damping form.
    // zeta = 0.02 column: the values below are the closed form evaluated directly, e.g. at r = 0.5
    // 8 (0.02)² (1.5) 0.5^1.5 / ((1 - 0.25)² + 4 (0.02)² (0.5)(1.5)²) = 0.00169706 / 0.5643
    // = 0.0030074. METHODS.md §3 lists 0.0030070, 0.0308160, 0.1257000, 0.3779850: those are off
    // by 1e-7 to 4e-7 (rounded too early), so its zeta = 0.02 entries are not used here.
    const table: [number, number, number][] = [
      [0.5, 0.0184865, 0.0030074],
      [0.8, 0.1656347, 0.0308158],
      [0.9, 0.4730277, 0.1256997],
      [0.95, 0.7914064, 0.3779851],
      [1.0, 1, 1],
    ]
    for (const [r, z5, z2] of table) {
      expect(cqcCorrelationEqual(r, 0.05)).toBeCloseTo(z5, 7)
      expect(cqcCorrelationEqual(r, 0.02)).toBeCloseTo(z2, 7)
    }
  })

  it('is symmetric in r -> 1/r for equal damping', () => {
    // closed form: rho(r) = rho(1/r) when zeta_i = zeta_j (swap of the two modes)
    expect(cqcCorrelationEqual(1 / 0.7, 0.05)).toBeCloseTo(cqcCorrelationEqual(0.7, 0.05), 12)
  })
})

describe('cqcCorrelation', () => {
  it('matches the unequal-damping check values', () => {
    // METHODS.md §3 (derived): zi = 0.02, zj = 0.05: r = 0.9 -> 0.2699377; r = 1.0 -> 0.9035079
    expect(cqcCorrelation(0.9, 0.02, 0.05)).toBeCloseTo(0.2699377, 7)
    expect(cqcCorrelation(1.0, 0.02, 0.05)).toBeCloseTo(0.9035079, 7)
  })

  it('reproduces the equal form when the damping ratios are equal', () => {
    // METHODS.md §3: equal-damping limit check
    for (const r of [0.3, 0.5, 0.8, 0.9, 0.95, 1, 1.3]) {
      expect(cqcCorrelation(r, 0.05, 0.05)).toBeCloseTo(cqcCorrelationEqual(r, 0.05), 12)
    }
  })

  it('stays symmetric when ratio and damping labels are swapped together', () => {
    // METHODS.md §3: rho_ij = rho_ji with r -> 1/r and zi <-> zj
    expect(cqcCorrelation(1 / 0.9, 0.05, 0.02)).toBeCloseTo(cqcCorrelation(0.9, 0.02, 0.05), 12)
  })
})

describe('combineCqc', () => {
  it('reduces to SRSS for well-separated modes', () => {
    // Wilson, Der Kiureghian & Bayo (1981): rho -> 0 for widely spaced frequencies
    const omega = [1, 10, 100]
    const R = [3, -4, 12]
    const rho = cqcMatrix(omega, 0.05)
    expect(combineCqc(R, rho)).toBeCloseTo(combineSrss(R), 2)
    expect(combineSrss(R)).toBeCloseTo(13, 12)
  })

  it('reduces to the absolute sum for identical frequencies', () => {
    // rho = 1 for r = 1: sqrt((sum R)²) = |sum R| (closed form)
    const rho = cqcMatrix([5, 5, 5], 0.05)
    expect(combineCqc([1, 2, 3], rho)).toBeCloseTo(6, 12)
    expect(combineCqc([1, -2, 3], rho)).toBeCloseTo(2, 12)
  })

  it('gives sqrt(R1² + R2² + 2 rho R1 R2) for two modes', () => {
    const rho = cqcMatrix([10, 11], 0.05)
    const r12 = cqcCorrelationEqual(1.1, 0.05)
    expect(rho[1]).toBeCloseTo(r12, 14)
    expect(combineCqc([2, 3], rho)).toBeCloseTo(Math.sqrt(4 + 9 + 12 * r12), 12)
  })

  it('uses the unequal form with damping per mode', () => {
    const rho = cqcMatrix([10, 9], [0.02, 0.05])
    // r = omega_j/omega_i = 0.9 with zi = 0.02, zj = 0.05 -> 0.2699377 (METHODS.md §3)
    expect(rho[1]).toBeCloseTo(0.2699377, 7)
    expect(rho[2]).toBeCloseTo(0.2699377, 7)
  })
})
