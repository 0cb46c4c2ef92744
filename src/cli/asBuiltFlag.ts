/**
 * `--as-built TEMP:KIND=VALUE[@X]`: one site measurement (KIND sag, returnTime, frequency or
 * horizontalTension; X the sag's position in m) → `asBuilt` in the results JSON, and a few
 * lines for the table.
 */
import {
  type AsBuiltResult,
  type Project,
  type ProjectResults,
  solveAsBuilt,
  validateAsBuilt,
} from '../core/index.ts';

export const AS_BUILT_FLAG = '--as-built';

const SPEC = /^([^:]+):([A-Za-z]+)=([^@]+)(?:@(.+))?$/;

/** The value given after `--as-built` (or `--as-built=...`) and the arguments without it. */
export function takeAsBuiltFlag(args: string[]): { spec?: string; rest: string[]; error?: string } {
  const rest: string[] = [];
  let spec: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === AS_BUILT_FLAG) {
      spec = args[i + 1];
      if (spec === undefined) return { rest, error: `${AS_BUILT_FLAG} needs TEMP:KIND=VALUE[@X]` };
      i++;
    } else if (a.startsWith(`${AS_BUILT_FLAG}=`)) spec = a.slice(AS_BUILT_FLAG.length + 1);
    else rest.push(a);
  }
  return { spec, rest };
}

/** Parse TEMP:KIND=VALUE[@X]; numbers that do not parse are passed on for validation to name. */
export function parseAsBuiltSpec(spec: string): Record<string, unknown> | undefined {
  const match = SPEC.exec(spec.trim());
  if (!match) return undefined;
  const num = (text: string) => (Number.isFinite(Number(text)) ? Number(text) : text);
  const [, temperature, kind, value, x] = match;
  return {
    temperature: num(temperature),
    kind,
    value: num(value),
    ...(x !== undefined ? { x: num(x) } : {}),
  };
}

/**
 * Solve the as-built check into `results.asBuilt`. Returns the exit status it calls for:
 * 2 an invalid measurement, 1 a measurement no wire state reaches or a case not solved, else 0.
 */
export function addAsBuilt(
  file: string,
  project: Project,
  results: ProjectResults,
  spec: string,
): number {
  const raw = parseAsBuiltSpec(spec);
  if (!raw) {
    process.stderr.write(`${AS_BUILT_FLAG}: "${spec}" is not TEMP:KIND=VALUE[@X]\n`);
    return 2;
  }
  const issues = validateAsBuilt(project, raw);
  if (issues.length > 0) {
    for (const issue of issues) process.stderr.write(`${file}: ${issue.path}: ${issue.message}\n`);
    return 2;
  }
  const asBuilt = solveAsBuilt(project, raw as never, results);
  results.asBuilt = asBuilt;
  if (!asBuilt.solved) {
    process.stderr.write(`${file}: as built: ${asBuilt.messages.join(' ')}\n`);
    return 1;
  }
  return 0;
}

export function asBuiltLines(a: AsBuiltResult): string[] {
  const m = a.measurement;
  const where = m.x !== undefined ? ` at ${m.x} m` : '';
  const change = (a.lengthDifference * 1000).toFixed(1);
  return [
    '',
    `As built — measured ${m.kind} ${m.value}${where} at ${m.temperature} °C:`,
    `  cut length ${a.unstressedLength.toFixed(4)} m (design ${a.designUnstressedLength.toFixed(4)} m, ${change} mm)`,
    ...a.cases.map(
      (c) => `  ${c.name}: ${c.ok ? 'pass' : 'FAIL'}${c.ok ? '' : ` — ${c.messages.join(' ')}`}`,
    ),
    ...a.messages.map((text) => `  ! ${text}`),
  ];
}
