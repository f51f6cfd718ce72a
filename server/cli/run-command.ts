import { z } from 'zod';
import { describeFitIssue, fitInputSchema, sheetInputSchema, tapeInputSchema } from '@/shared/fit';
import { fitSight } from '@/math/fit/fit-sight';
import { isFitInputError } from '@/math/fit/fit-input-error';
import { tapeSvg } from '@/math/tape/tape-svg';
import { printSheetSvg } from '@/math/sheet/print-sheet-svg';
import { sheetPdf } from '@/server/print/sheet-pdf';

/**
 * The `pinwright` command line, as a function: arguments and stdin text in,
 * exit code and output out, so it can be tested without spawning. The contract
 * (commands, input, output, exit codes) is documented in math/README.md.
 *
 * Exit codes: 0 success; 2 bad input (one line on stderr naming the field);
 * 1 anything else (a bug: report it).
 * Example: await runCommand(['fit'], '{"distanceUnit":"yd", …}') → { code: 0, stdout: '{\n  "speedFps": …', stderr: '' }
 */
export interface CommandOutcome {
  code: 0 | 1 | 2;
  stdout: string | Buffer;
  stderr: string;
}

/** What `pinwright help` prints. */
export const USAGE = `Usage: pinwright <command> [--pdf] < input.json
Commands:
  fit      fit the marks; prints the fit as JSON
  tape     prints the tape as SVG (input adds "tape": { from, to, step, unit, widthMm, orientation, mirror })
  sheet    prints the print sheet as SVG (adds "paper": "a4" | "letter", "labels": { bow, build, date }); --pdf prints a PDF
See math/README.md for the input and output.`;

const schemas = { fit: fitInputSchema, tape: tapeInputSchema, sheet: sheetInputSchema } as const;

export async function runCommand(args: readonly string[], stdinText: string, today: () => string = todayIso): Promise<CommandOutcome> {
  const [command, ...flags] = args;
  if (command === undefined || command === 'help' || command === '--help' || command === '-h') {
    return {
      code: command === undefined ? 2 : 0,
      stdout: command === undefined ? '' : `${USAGE}\n`,
      stderr: command === undefined ? `${USAGE}\n` : '',
    };
  }
  if (!(command in schemas)) return bad(`command: "${command}" is not a pinwright command (fit, tape, sheet)`);
  const pdf = flags.includes('--pdf');
  const unknownFlag = flags.find((flag) => flag !== '--pdf');
  if (unknownFlag !== undefined) return bad(`${unknownFlag}: not an option of pinwright ${command}`);
  if (pdf && command !== 'sheet') return bad('--pdf: only pinwright sheet writes a PDF');

  let json: unknown;
  try {
    json = JSON.parse(stdinText);
  } catch (error) {
    return bad(`input: not valid JSON (${(error as Error).message.split('\n')[0]})`);
  }
  const parsed = schemas[command as keyof typeof schemas].safeParse(json);
  if (!parsed.success) return bad(describeFitIssue(parsed.error.issues[0] as z.ZodIssue));

  try {
    if (command === 'fit') {
      const fit = fitSight(json as z.input<typeof fitInputSchema>);
      return { code: 0, stdout: `${JSON.stringify(fit, null, 2)}\n`, stderr: '' };
    }
    const { tape, paper, labels, variants, ...fitInput } = parsed.data as z.infer<typeof sheetInputSchema>;
    const fit = fitSight(fitInput);
    if (command === 'tape') return { code: 0, stdout: `${tapeSvg(fit, tape ?? {})}\n`, stderr: '' };
    const svg = printSheetSvg(fit, { paper, variants, tape, labels: { ...labels, date: labels?.date ?? today() } });
    return { code: 0, stdout: pdf ? await sheetPdf(svg, paper) : `${svg}\n`, stderr: '' };
  } catch (error) {
    if (isFitInputError(error)) return bad(error.message);
    return { code: 1, stdout: '', stderr: `pinwright: ${(error as Error).stack ?? String(error)}\n` };
  }
}

function bad(line: string): CommandOutcome {
  return { code: 2, stdout: '', stderr: `${line.replace(/\s*\n\s*/g, ' ')}\n` };
}

function todayIso(): string {
  return new Date().toISOString().slice(0, 10);
}
