/** Column 1 is A, 27 would be AA (racks stop at 12 columns; the scheme does not). */
export function columnLetter(column: number): string {
  let n = column;
  let letters = '';
  while (n > 0) {
    const rest = (n - 1) % 26;
    letters = String.fromCharCode(65 + rest) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** Rack R2, third level from the top, second column: "R2-3B" (the format keepers already write). */
export const tubLabel = (rackName: string, level: number, column: number): string => `${rackName}-${level}${columnLetter(column)}`;

/** Every slot of a rack, top level first, left to right. */
export function tubSlots(rackName: string, levels: number, columns: number): { level: number; column: number; label: string }[] {
  const slots = [];
  for (let level = 1; level <= levels; level++) {
    for (let column = 1; column <= columns; column++) slots.push({ level, column, label: tubLabel(rackName, level, column) });
  }
  return slots;
}
