// The id of a spec-drawn input: derived from its spec, the item it edits and its field, so a link can name the exact
// box that fixes a finding ("/supply#primary-fuse--pf--primaryFuseA") and the id stays the same across renders.
// The item is the form's id prefix: `r-<rail id>`, `w-<winding id>`, `t-<transformer id>`, `s-<stage id>`,
// `p-<part id>`, `o-<offer id>`, `l-<line id>`; a fixed word for a form of which a page has one (`pf`, `enc`, `al`);
// `project` for the project's own settings.

const slug = (s: string) => s.replace(/[^A-Za-z0-9_-]+/g, '-');

export const PROJECT_ITEM = 'project';

/** Item prefixes, the same the pages pass as `idp`. */
export const ITEM = {
  stage: (id: string) => `s-${id}`,
  rail: (id: string) => `r-${id}`,
  winding: (id: string) => `w-${id}`,
  transformer: (id: string) => `t-${id}`,
  part: (id: string) => `p-${id}`,
  offer: (id: string) => `o-${id}`,
  line: (id: string) => `l-${id}`,
  /** the supply page's primary-fuse form */
  primaryFuse: 'pf',
  /** the supply page's enclosure form */
  enclosure: 'enc',
  /** the parts list's "add a line" form */
  addLine: 'al',
  /** the parts list's costing form */
  costing: 'cs',
} as const;

/** `spec--item--field`, each part reduced to letters, digits, `_` and `-` (a field path's dots become `-`). */
export function fieldId(specName: string, item: string, field: string): string {
  return `${slug(specName)}--${slug(item)}--${slug(field)}`;
}
