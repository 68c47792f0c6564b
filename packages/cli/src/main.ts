#!/usr/bin/env node
/** The `hushmark` executable. */
import { run } from "./cli.js";
import { processIo } from "./io.js";

process.exitCode = await run(process.argv.slice(2), processIo());
