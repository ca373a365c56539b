// Guards for programming misuse. Expected failures are values; these throw.

/** Throws `<name> must be a finite number, got <value>` unless value is finite. */
export function assertFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${name} must be a finite number, got ${String(value)}`);
  }
}

/** Throws `<name> must be >= 0, got <value>` unless value is a finite non-negative number. */
export function assertNonNegative(name: string, value: number): void {
  assertFinite(name, value);
  if (value < 0) throw new Error(`${name} must be >= 0, got ${String(value)}`);
}

/** Throws `<name> must be > 0, got <value>` unless value is a finite positive number. */
export function assertPositive(name: string, value: number): void {
  assertFinite(name, value);
  if (value <= 0) throw new Error(`${name} must be > 0, got ${String(value)}`);
}

/** Expected-failure result shape shared by every "try" path of the engine. */
export type Failure = { ok: false; reason: string };
export type Success<T> = { ok: true; value: T };
export type Result<T> = Success<T> | Failure;

export const fail = (reason: string): Failure => ({ ok: false, reason });
export const succeed = <T>(value: T): Success<T> => ({ ok: true, value });
