/**
 * The error raised when a value cannot be represented exactly (1/(1+N), log ε, Γ(1/2),
 * exp of a non-vanishing argument) or an operation lacks the precision it needs. It is an
 * InputError: the request, not the engine, is at fault; the parser adds the position.
 */
import { InputError } from '../errors.ts';

/** A value outside the exact algebra, or a series too imprecise for the operation asked. */
export class AlgebraError extends InputError {
  constructor(message: string, hint?: string) {
    super(message, undefined, hint);
  }
}
