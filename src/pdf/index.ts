// Public API of the PDF pack.
export { buildPack, buildPackWithInfo, type PackResult } from './pack';
export { PACK_PARTS, PACK_PART_TITLES, type PackOptions, type PackPart, type PackReport } from './report';
export { PAPER_SIZES_PT, type Paper } from './layout';
export { benchPack, largeBomProject } from './bench';
