import { runCommand } from '@/server/cli/run-command';

/**
 * Entry of the `pinwright` command (loaded by pinwright.js through tsx): reads
 * all of stdin, runs the command, writes stdout/stderr and sets the exit code.
 * Contract: math/README.md.
 * Example: echo '{…}' | npx pinwright fit
 */
async function main(): Promise<void> {
  const chunks: Buffer[] = [];
  if (!process.stdin.isTTY) for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
  const outcome = await runCommand(process.argv.slice(2), Buffer.concat(chunks).toString('utf8'));
  if (outcome.stdout.length > 0) process.stdout.write(outcome.stdout);
  if (outcome.stderr) process.stderr.write(outcome.stderr);
  process.exitCode = outcome.code;
}

main().catch((error: unknown) => {
  process.stderr.write(`pinwright: ${(error as Error).stack ?? String(error)}\n`);
  process.exitCode = 1;
});
