import { parseArgs, type ParseArgsConfig } from 'node:util';
import { CliError } from './cli-error';

export type OptionSpec = NonNullable<ParseArgsConfig['options']>;
export type ParsedValues = Record<string, string | boolean | string[] | undefined>;

/** A negative number as an option's value ("-5", "-0.3", "-1e-3"), not an option name. */
const NEGATIVE_NUMBER = /^-(\d|\.\d)/;

/**
 * "--value -5" as "--value=-5": Node's parser takes a value starting with "-" for an option name and
 * stops with "argument is ambiguous"; a negative number after an option that takes a value is its value.
 */
export function joinNegativeValues(argv: string[], options: OptionSpec): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const name = argv[i].startsWith('--') ? argv[i].slice(2) : null;
    const next = argv[i + 1];
    if (name !== null && Object.hasOwn(options, name) && options[name].type === 'string' && next !== undefined && NEGATIVE_NUMBER.test(next)) {
      out.push(`${argv[i]}=${next}`);
      i++;
    } else out.push(argv[i]);
  }
  return out;
}

/** Parses argv against a spec; unknown options and missing values become one-line CLI errors. */
export function parseOptions(argv: string[], options: OptionSpec, command: string): { values: ParsedValues; positionals: string[] } {
  try {
    const { values, positionals } = parseArgs({ args: joinNegativeValues(argv, options), options, allowPositionals: true, strict: true });
    return { values: values as ParsedValues, positionals };
  } catch (error) {
    const message = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new CliError(`${message.replace(/\. To specify.*$/, '')} (see 'outcouple ${command} --help')`);
  }
}

/** Reads a finite number option within [min, max]; `undefined` when absent and no fallback is given. */
export function numberOption(values: ParsedValues, name: string, min: number, max: number, fallback?: number): number {
  const raw = values[name];
  if (raw === undefined) {
    if (fallback === undefined) throw new CliError(`--${name} is required (a number from ${min} to ${max})`);
    return fallback;
  }
  if (typeof raw !== 'string' || raw.trim() === '') throw new CliError(`--${name} needs a number from ${min} to ${max}`);
  const value = Number(raw);
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new CliError(`--${name} must be a number from ${min} to ${max} (got '${truncate(raw)}')`);
  }
  return value;
}

/** Reads an integer option within [min, max]. */
export function integerOption(values: ParsedValues, name: string, min: number, max: number, fallback?: number): number {
  const value = numberOption(values, name, min, max, fallback);
  if (!Number.isInteger(value)) throw new CliError(`--${name} must be a whole number from ${min} to ${max} (got '${value}')`);
  return value;
}

/** Reads one of a fixed set of words. */
export function choiceOption<T extends string>(values: ParsedValues, name: string, choices: readonly T[], fallback: T): T {
  const raw = values[name];
  if (raw === undefined) return fallback;
  if (typeof raw !== 'string' || !(choices as readonly string[]).includes(raw)) {
    throw new CliError(`--${name} must be one of ${choices.join(', ')} (got '${truncate(String(raw))}')`);
  }
  return raw as T;
}

/** Reads a string option, or undefined. */
export function stringOption(values: ParsedValues, name: string): string | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  if (typeof raw !== 'string' || raw.trim() === '') throw new CliError(`--${name} needs a value`);
  if (raw.length > 200) throw new CliError(`--${name} is too long (at most 200 characters)`);
  return raw.trim();
}

/** Parses a size like "1x1" or "1x1x0.15" (mm) into its parts, each within [min, max]. */
export function sizeOption(values: ParsedValues, name: string, parts: 2 | 3, min: number, max: number, fallback?: number[]): number[] {
  const raw = values[name];
  if (raw === undefined) {
    if (!fallback) throw new CliError(`--${name} is required (e.g. ${parts === 2 ? '1x1' : '1x1x0.15'}, mm)`);
    return fallback;
  }
  const pieces = String(raw).toLowerCase().split(/[x×*]/).map((p) => p.trim());
  const allowed = parts === 2 ? [2] : [2, 3];
  if (!allowed.includes(pieces.length)) {
    throw new CliError(`--${name} must look like ${parts === 2 ? 'WIDTHxLENGTH' : 'WIDTHxLENGTH[xHEIGHT]'} in mm, each from ${min} to ${max} (got '${truncate(String(raw))}')`);
  }
  return pieces.map((p) => {
    const value = p === '' ? NaN : Number(p);
    if (!Number.isFinite(value) || value < min || value > max) {
      throw new CliError(`--${name} sizes must each be from ${min} to ${max} mm (got '${truncate(String(raw))}')`);
    }
    return value;
  });
}

export function truncate(text: string, length = 40): string {
  return text.length > length ? `${text.slice(0, length)}…` : text;
}
