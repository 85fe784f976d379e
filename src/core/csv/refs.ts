// Reference designators: "R1, R2 R5;C3" lists, "R1-R4" ranges (same prefix, ascending).

/** Number of parts a designator list names, or null when it cannot be read. "R1-R4, C7" -> 5. */
export function countRefs(refs: string): number | null {
  const items = refs.split(/[\s,;]+/).filter((x) => x !== '');
  let n = 0;
  for (const item of items) {
    const range = /^([A-Za-z]+)(\d+)[-–]([A-Za-z]*)(\d+)$/.exec(item);
    if (range) {
      const [, p1, a, p2, b] = range;
      if ((p2 !== '' && p2 !== p1) || Number(b) < Number(a)) return null;
      n += Number(b) - Number(a) + 1;
    } else n += 1;
  }
  return n;
}
