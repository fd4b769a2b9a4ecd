/**
 * Throws a RangeError unless T is a positive, finite number of kelvin. For functions whose
 * callers validate user input first, so a bad temperature here is a programmer error.
 */
export function assertTemperature(temperatureK: number): void {
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) throw new RangeError(`temperature must be positive and finite, got ${temperatureK}`);
}
