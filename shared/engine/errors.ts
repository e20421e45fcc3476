/**
 * Bad input found by the engine (the schema cannot know an alloy's data range).
 * `fields` maps request paths such as "segments.0.startTempC" to a message for people.
 */
export class EngineInputError extends Error {
  readonly fields: Record<string, string>;

  constructor(fields: Record<string, string>, message = 'The calculation cannot use these inputs') {
    super(message);
    this.name = 'EngineInputError';
    this.fields = fields;
    // Keeps instanceof working when a bundler down-levels classes.
    Object.setPrototypeOf(this, new.target.prototype);
  }
}

/** A temperature outside a table's range, thrown deep inside the engine and mapped to a field by the caller. */
export class TemperatureRangeError extends Error {
  constructor(
    readonly tempC: number,
    readonly limitC: number,
    readonly side: 'above' | 'below',
    readonly table: string,
  ) {
    super(
      side === 'above'
        ? `${tempC} °C is above the ${table} data (max ${limitC} °C)`
        : `${tempC} °C is below ${limitC} °C`,
    );
    this.name = 'TemperatureRangeError';
    Object.setPrototypeOf(this, new.target.prototype);
  }
}

export function isEngineInputError(e: unknown): e is EngineInputError {
  return e instanceof EngineInputError || (e instanceof Error && e.name === 'EngineInputError' && 'fields' in e);
}
