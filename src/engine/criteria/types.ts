/** Shapes shared by the built-in criterion set files. */
import type { CriterionSetSpec } from '@/model'
import type { CriterionScope } from '../results'

/** Clause text per rule of a set, shown beside each check row. */
export interface CriterionClauses {
  readonly ratio?: string
  readonly extreme?: string
  readonly amplification?: string
  readonly eccentricity?: string
  readonly radius?: string
  readonly accidental?: string
}

/** Words for the classification of a story by the ratio rules. */
export interface CriterionLabels {
  readonly regular: string
  readonly irregular: string
  readonly extreme: string
}

/** A built-in set: its thresholds (plain data) plus clause texts, labels and notes. */
export interface BuiltInCriterionSet {
  readonly spec: CriterionSetSpec
  readonly clauses: CriterionClauses
  readonly labels: CriterionLabels
  /** Assumptions and limits of the set as implemented, shown with every evaluation. */
  readonly notes: readonly string[]
  /** Conditions of its plan-regularity clause that are checked and not checked, when not all are. */
  readonly regularityScope?: CriterionScope
}
