export type RankRangeBarProps = { baseRank: number; minRank: number; maxRank: number; count: number; unstable: boolean };

/**
 * A site's rank range over ranks 1 … n as a small bar (rank 1 on the left), with the base rank marked.
 * @param props the base rank, the best and worst rank across bandwidths, the number of candidates
 * @returns the bar (an image with a text alternative)
 * @example <RankRangeBar baseRank={3} minRank={1} maxRank={4} count={10} unstable />
 */
export function RankRangeBar({ baseRank, minRank, maxRank, count, unstable }: RankRangeBarProps) {
  // Rank r sits at the centre of slot r of n equal slots.
  const at = (rank: number) => ((rank - 0.5) / Math.max(1, count)) * 100;
  const slot = 100 / Math.max(1, count);
  return (
    <div
      role="img"
      aria-label={`Rank ${minRank} to ${maxRank} of ${count}; ${baseRank} on the run’s surface`}
      className="relative h-3 w-40 rounded-full bg-sunken"
    >
      <span
        className={`absolute top-0.5 h-2 rounded-full ${unstable ? 'bg-caution' : 'bg-accent/60'}`}
        style={{ left: `${at(minRank) - slot / 2}%`, width: `${at(maxRank) - at(minRank) + slot}%` }}
      />
      <span className="absolute top-0 h-3 w-0.5 -translate-x-1/2 bg-ink" style={{ left: `${at(baseRank)}%` }} />
    </div>
  );
}
