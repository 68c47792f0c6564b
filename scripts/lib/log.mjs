// Small console helpers for the set-up scripts (no dependencies: they run before npm install).
const useColour = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code, text) => (useColour ? `\u001b[${code}m${text}\u001b[0m` : text);

export const step = (text) => console.log(paint("36", "›"), text);
export const done = (text) => console.log(paint("32", "✓"), text);
export const warn = (text) => console.log(paint("33", "!"), text);
export const fail = (text) => console.error(paint("31", "✗"), text);
export const bold = (text) => paint("1", text);
