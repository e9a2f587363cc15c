/**
 * Thrown by inverse functions when no redshift gives the requested value (e.g. a look-back time
 * longer than the age of the universe, or an angular-diameter distance above its maximum), and by a
 * published law asked outside the range it is defined over (an extinction law beyond its wavelengths).
 * A RangeError, so callers that only distinguish RangeError/TypeError still work.
 */
export class NoSolutionError extends RangeError {
  constructor(message: string) {
    super(message);
    this.name = "NoSolutionError";
  }
}
