import { run } from './src/cli/commands/claim';
run(process.argv.slice(2));
