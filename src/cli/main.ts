import { CliError } from './cli-error';
import * as escape from './commands/escape';
import * as stack from './commands/stack';
import * as dome from './commands/dome';
import * as material from './commands/material';
import * as trace from './commands/trace';
import * as claim from './commands/claim';
import * as variants from './commands/variants';
import * as color from './commands/color';
import * as mie from './commands/mie';
import * as phosphorLoad from './commands/phosphor-load';
import * as phosphorSweep from './commands/phosphor-sweep';
import * as compare from './commands/compare';
import * as optic from './commands/optic';

type Command = { summary: string; help: string; run: (argv: string[]) => Promise<void> | void };

const commands: Record<string, Command> = { escape, stack, dome, material, trace, claim, compare, variants, color, mie, 'phosphor-load': phosphorLoad, 'phosphor-sweep': phosphorSweep, optic };

function usage(): string {
  const lines = ['outcouple — LED package light extraction from the command line', '', 'Commands:'];
  for (const [name, command] of Object.entries(commands)) lines.push(`  ${name.padEnd(13)} ${command.summary}`);
  lines.push('', "Add --json for one JSON object. 'outcouple <command> --help' lists a command's options.");
  return lines.join('\n');
}

/** Runs the command line; returns the exit code (0 ok, 2 bad input, 1 unexpected failure). */
export async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === '--help' || name === '-h' || name === 'help') {
    process.stdout.write(usage() + '\n');
    return name ? 0 : 2;
  }
  // own keys only: '__proto__', 'constructor' and 'toString' are not commands
  const command = Object.hasOwn(commands, name) ? commands[name] : undefined;
  if (!command) {
    process.stderr.write(`outcouple: unknown command '${name.slice(0, 40)}' (one of ${Object.keys(commands).join(', ')})\n`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    process.stdout.write(command.help + '\n');
    return 0;
  }
  try {
    await command.run(rest);
    return 0;
  } catch (error) {
    if (error instanceof CliError || error instanceof RangeError) {
      process.stderr.write(`outcouple ${name}: ${error.message.split('\n')[0]}\n`);
      return 2;
    }
    process.stderr.write(`outcouple ${name}: unexpected failure: ${error instanceof Error ? error.message : String(error)}\n`);
    return 1;
  }
}
