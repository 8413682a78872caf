/**
 * Contracts shared by the circuit layer: the frequency-domain link solver, the loads and the
 * transient engine all see a nonlinear two-terminal element the same way.
 */

/**
 * A memoryless nonlinear two-terminal element (diode, LED): current as a function of the
 * voltage across it (anode − cathode), and its derivative for Newton's method.
 * Both must be finite for every finite v (no NaN, no overflow: continue linearly far beyond
 * the physical range).
 */
export interface DiodeModel {
  /** current anode → cathode at voltage v, A */
  current(v: number): number;
  /** dI/dV at v, S (> 0) */
  conductance(v: number): number;
  /** a short label for reports, e.g. "red LED (preset)" */
  readonly label?: string;
}
