/** What the CLI needs from its process, passed in so `run` can be driven from tests and bin.ts. */
import type { TempFileTracker } from '../util/write-file.js';

/** A stream the CLI writes text to. */
export interface TextSink {
  write(chunk: string): unknown;
}

/** The process around one CLI run. */
export interface CliIo {
  readonly stdout: TextSink;
  readonly stderr: TextSink;
  /** Working folder: relative paths in flags are resolved against it. */
  readonly cwd: string;
  readonly env: Readonly<Record<string, string | undefined>>;
  /** stdout is a terminal (colour is used only then, and never with NO_COLOR). */
  readonly isTTY: boolean;
  /** Width of the stdout terminal, for wrapping the text report. @default the formatter's */
  readonly columns?: number;
  /** stderr is a terminal (the progress display is shown only then). @default false */
  readonly stderrIsTTY?: boolean;
  /** Records temp files of atomic writes so a signal handler can remove them. @default none */
  readonly tempFiles?: TempFileTracker;
}

/** True when `env.DEBUG` asks for linkweave's stack traces (`DEBUG=linkweave` or `DEBUG=*`). */
export function debugEnabled(env: CliIo['env']): boolean {
  return (env.DEBUG ?? '').split(/[\s,]+/).some((d) => d === 'linkweave' || d === '*' || d === 'linkweave*');
}

/** Colour on stdout: only on a terminal, never when NO_COLOR is set to a non-empty value (no-color.org). */
export function colorEnabled(io: Pick<CliIo, 'env' | 'isTTY'>): boolean {
  const noColor = io.env.NO_COLOR;
  return io.isTTY && (noColor === undefined || noColor === '');
}
