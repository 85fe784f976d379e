// Public API of the PDF pack.
export { buildPack, buildPackWithInfo, type PackResult } from './pack';
export type { PackOptions, PackReport } from './report';
export { PAPER_SIZES_PT, type Paper } from './layout';
export { benchPack, largeBomProject } from './bench';
