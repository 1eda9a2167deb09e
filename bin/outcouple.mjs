#!/usr/bin/env node
// Command-line entry: loads the TypeScript command line through tsx, so the CLI runs the same core as the app.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
