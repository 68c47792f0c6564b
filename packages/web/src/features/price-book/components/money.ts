/** Money in the firm's currency, as the client reads it. */
export function formatMoney(amount: number, currency = "USD"): string {
  try {
    return new Intl.NumberFormat("en-US", { style: "currency", currency, maximumFractionDigits: 2 }).format(amount);
  } catch {
    return `${amount.toFixed(2)} ${currency}`;
  }
}

export const familyLabels: Record<string, string> = { sealing: "Sealing", mass: "Mass", decoupling: "Decoupling", damping: "Damping", ducts: "Ducts", impact: "Impact" };
export const flagLabels: Record<string, string> = {
  "blocks-daylight": "blocks daylight",
  "reduces-ventilation": "reduces ventilation",
  "structural-work": "structural work",
  "neighbour-access": "needs the neighbour's side",
  "changes-appearance": "changes the look",
};

/** How a steady level is commonly described (docs/acoustics-model.md, "Plain language"). */
export function levelWords(dba: number): string {
  if (dba < 20) return "about as quiet as a recording studio";
  if (dba < 30) return "about as quiet as a bedroom at night";
  if (dba < 40) return "about as loud as a quiet library";
  if (dba < 50) return "about as loud as a quiet office";
  if (dba < 60) return "about as loud as a conversation across a table";
  if (dba < 70) return "about as loud as a busy restaurant";
  return "loud — raised voices are needed";
}
