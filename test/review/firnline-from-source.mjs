// `firnline` run from the TypeScript sources (with --import ./ts-register.mjs), as bin/firnline.js runs the build.
import { main } from '../../src/cli/main.ts';

process.exitCode = await main(process.argv.slice(2));
