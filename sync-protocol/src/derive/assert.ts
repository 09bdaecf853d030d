// Input guards shared by the derivations. Messages name the field and the value received so a
// person reading them on a phone can tell what to correct.

export function requireFinite(what: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${what} must be a number; got ${String(value)}`);
  }
  return value;
}

export function requireNonNegative(what: string, value: number): number {
  requireFinite(what, value);
  if (value < 0) throw new RangeError(`${what} cannot be negative; got ${value}`);
  return value;
}

export function requirePositive(what: string, value: number): number {
  requireFinite(what, value);
  if (value <= 0) throw new RangeError(`${what} must be greater than zero; got ${value}`);
  return value;
}

export function requireOneOf<T extends string>(what: string, value: T, allowed: readonly T[]): T {
  if (!allowed.includes(value)) {
    throw new RangeError(`${what} must be one of ${allowed.join(', ')}; got ${String(value)}`);
  }
  return value;
}
