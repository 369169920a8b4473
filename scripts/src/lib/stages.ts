import { color, seconds } from './log.js';

export const STAGE_NAMES = [
  'lint',
  'format',
  'typecheck',
  'unit',
  'integration',
  'migration-check',
  'reliability',
  'e2e',
] as const;
export type StageName = (typeof STAGE_NAMES)[number];

/** `npm test -- unit e2e` → ['unit', 'e2e'] in pipeline order; no arguments → every stage. */
export function parseStageArgs(args: readonly string[]): StageName[] {
  const wanted = args.filter((arg) => arg !== '--');
  if (wanted.length === 0) return [...STAGE_NAMES];
  const unknown = wanted.filter((arg) => !(STAGE_NAMES as readonly string[]).includes(arg));
  if (unknown.length > 0) {
    throw new Error(
      `Unknown test stage ${unknown.map((u) => `"${u}"`).join(', ')}; choose from ${STAGE_NAMES.join(', ')}.`,
    );
  }
  return STAGE_NAMES.filter((name) => wanted.includes(name));
}

export interface StageResult {
  name: string;
  status: 'passed' | 'failed' | 'not run';
  ms: number;
  error?: string;
}

export interface Stage {
  name: string;
  /** Shown in the header, e.g. the command line. */
  describe: string;
  run: () => Promise<void>;
}

/** Runs stages in order with a header and a duration each; stops at the first failure. */
export async function runStages(stages: readonly Stage[]): Promise<StageResult[]> {
  const results: StageResult[] = [];
  let failed = false;
  for (const [index, stage] of stages.entries()) {
    if (failed) {
      results.push({ name: stage.name, status: 'not run', ms: 0 });
      continue;
    }
    console.log(
      `\n${color.bold(`━━ [${index + 1}/${stages.length}] ${stage.name}`)} ${color.dim(stage.describe)}`,
    );
    const started = Date.now();
    try {
      await stage.run();
      const ms = Date.now() - started;
      results.push({ name: stage.name, status: 'passed', ms });
      console.log(color.green(`✓ ${stage.name} passed in ${seconds(ms)}`));
    } catch (error) {
      const ms = Date.now() - started;
      const message = error instanceof Error ? error.message : String(error);
      results.push({ name: stage.name, status: 'failed', ms, error: message });
      console.log(color.red(`✗ ${stage.name} failed after ${seconds(ms)}: ${message}`));
      failed = true;
    }
  }
  return results;
}

export function formatSummary(results: readonly StageResult[]): string {
  const width = Math.max(...results.map((result) => result.name.length));
  const lines = results.map((result) => {
    const mark =
      result.status === 'passed' ? color.green('✓') : result.status === 'failed' ? color.red('✗') : '-';
    const time = result.status === 'not run' ? 'not run' : seconds(result.ms);
    return `  ${mark} ${result.name.padEnd(width)}  ${time}`;
  });
  return ['Summary', ...lines].join('\n');
}
