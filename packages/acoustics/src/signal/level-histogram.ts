/** A fixed-size histogram of levels in 0.1 dB steps, for statistical levels (L10, L90) in bounded memory. */
export class LevelHistogram {
  static readonly MIN_DB = -200;
  static readonly MAX_DB = 60;
  static readonly STEP_DB = 0.1;
  private readonly counts = new Float64Array(Math.round((LevelHistogram.MAX_DB - LevelHistogram.MIN_DB) / LevelHistogram.STEP_DB) + 1);
  private total = 0;

  add(levelDb: number): void {
    const clamped = Math.min(LevelHistogram.MAX_DB, Math.max(LevelHistogram.MIN_DB, levelDb));
    const bin = Math.round((clamped - LevelHistogram.MIN_DB) / LevelHistogram.STEP_DB);
    this.counts[bin] = (this.counts[bin] ?? 0) + 1;
    this.total += 1;
  }

  get size(): number {
    return this.total;
  }

  /** The level in dB exceeded during `percent` % of the samples (L10: percent = 10), or null when empty. */
  exceededDb(percent: number): number | null {
    if (this.total === 0) return null;
    const below = this.total * (1 - percent / 100);
    let seen = 0;
    for (let i = 0; i < this.counts.length; i++) {
      seen += this.counts[i]!;
      if (seen >= below) return LevelHistogram.MIN_DB + i * LevelHistogram.STEP_DB;
    }
    return LevelHistogram.MAX_DB;
  }
}
