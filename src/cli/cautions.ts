/** The cautions every user sees: in `--help`, in the README, and at the head of a checklist. */
export const CAUTIONS = [
  'Cautions: Firnline supports, and does not replace, expert review. Reference values carry',
  'uncertainty and dates, and new literature can move them. Flags are suggestions for an editor',
  'to judge; the cited sources are what to read.',
].join('\n');
