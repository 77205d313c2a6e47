/** 'spools' → 'spool', 'boxes' → 'box', 'feet' → 'foot'; other words as given. */
export function singular(noun: string): string {
  if (noun === 'feet') return 'foot';
  if (noun.endsWith('xes')) return noun.slice(0, -2);
  return noun.endsWith('s') ? noun.slice(0, -1) : noun;
}

/**
 * "40 spools", "1 spool": a count with its unit as packing slips write it. Every screen that
 * prints a number of units (lots, returns, shipments, concessions, the supplier's page) says
 * it through this, so a lot of one never reads "1 reels".
 */
export function countOf(quantity: number, unit: string): string {
  const noun = unit.trim() || 'units';
  return `${quantity} ${quantity === 1 ? singular(noun) : noun}`;
}
