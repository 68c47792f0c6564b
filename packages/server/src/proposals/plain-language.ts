/**
 * Plain words next to the numbers a client reads. The bands and their basis are in
 * docs/acoustics-model.md ("Plain language"); they are common-practice descriptions, not a standard.
 */

/** How a steady A-weighted level in a room is commonly described (common practice). */
export function levelPhrase(dba: number): string {
  if (dba < 20) return "about as quiet as a recording studio — most people hear nothing";
  if (dba < 30) return "about as quiet as a bedroom at night";
  if (dba < 40) return "about as loud as a quiet library";
  if (dba < 50) return "about as loud as a quiet office";
  if (dba < 60) return "about as loud as a conversation across a table";
  if (dba < 70) return "about as loud as a busy restaurant";
  return "loud — raised voices are needed to talk over it";
}

/**
 * What happens to ordinary speech on the other side: speech of about 60 dBA (common practice for
 * a normal voice at 1 m) reduced by the same A-weighted drop the sound sees on its way.
 */
export function speechPhrase(sourceDba: number, receivedDba: number): string {
  const heard = 60 - (sourceDba - receivedDba);
  if (heard >= 35) return "understood";
  if (heard >= 25) return "heard and partly understood";
  if (heard >= 15) return "audible but not understood";
  return "barely audible";
}

export const PREDICTION_BASIS =
  "Predicted by Hushmark's sound-transmission model from the surveyed plan, the constructions recorded on site and a typical spectrum for the noise source; levels are A-weighted (dBA) at the receiving room. Speech wording assumes a normal voice of about 60 dBA.";

export const DISCLAIMER =
  "Predictions are estimates. Real results depend on workmanship, hidden construction and paths not visible during the survey; they are typically within a few decibels of the prediction. We measure after the work and report the result.";

/** "From about X to about Y dBA in the studio; speech next door goes from understood to barely audible." */
export function improvementSummary(room: string, source: string, sourceDba: number, beforeDba: number, afterDba: number): { before: string; after: string; summary: string } {
  const before = `about ${Math.round(beforeDba)} dBA — ${levelPhrase(beforeDba)}`;
  const after = `about ${Math.round(afterDba)} dBA — ${levelPhrase(afterDba)}`;
  const sb = speechPhrase(sourceDba, beforeDba);
  const sa = speechPhrase(sourceDba, afterDba);
  const speech = sb === sa ? `speech from ${source} stays ${sa}` : `speech from ${source} goes from ${sb} to ${sa}`;
  return { before, after, summary: `From about ${Math.round(beforeDba)} to about ${Math.round(afterDba)} dBA in ${room}; ${speech}.` };
}
