/** Thrown for a run that cannot proceed (solver failure, inconsistent inputs found at run time). */
export class SimulationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SimulationError';
  }
}
