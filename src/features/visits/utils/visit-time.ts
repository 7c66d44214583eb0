/**
 * The viewer's day around `now`, the days after it, and the weeks before it (a visit started
 * earlier and never closed), as the list query's `from`/`to`: the same strings all day long, so
 * the loader and the page share their cached answers.
 */
export function dayRanges(now = new Date(), upcomingDays = 14, earlierDays = 30) {
  const day = (offset: number) => new Date(now.getFullYear(), now.getMonth(), now.getDate() + offset).toISOString();
  return {
    earlier: { from: day(-earlierDays), to: day(0) },
    today: { from: day(0), to: day(1) },
    upcoming: { from: day(1), to: day(1 + upcomingDays) },
  };
}
