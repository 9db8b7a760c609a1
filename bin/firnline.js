#!/usr/bin/env node
// Thin launcher: the CLI lives in dist/cli/main.js, built by `npm run build` (run on `prepare`).
import { main } from '../dist/cli/main.js';

process.exitCode = await main(process.argv.slice(2));
