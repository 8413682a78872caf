/**
 * Failure of the transient engine on legal input: Newton's method did not converge even
 * after the step was reduced many times. (Bad input throws TanklightInputError instead.)
 */
export class TransientConvergenceError extends Error {
  /** simulated time at which the step failed, s */
  readonly time: number;
  /** the smallest step tried, s */
  readonly step: number;
  /** names of the diodes whose voltage was still changing */
  readonly elements: readonly string[];
  constructor(message: string, time: number, step: number, elements: readonly string[]) {
    super(message);
    this.name = "TransientConvergenceError";
    this.time = time;
    this.step = step;
    this.elements = elements;
  }
}
