/** Every command of the `hushmark` command line; add a command by adding its file and one line here. */
import { analyzeCommand } from "./analyze.js";
import type { Command } from "./command.js";
import { rateCommand } from "./rate.js";
import { solveCommand } from "./solve.js";
import { upgradesCommand } from "./upgrades.js";

export const COMMANDS: readonly Command[] = [rateCommand, solveCommand, upgradesCommand, analyzeCommand];
