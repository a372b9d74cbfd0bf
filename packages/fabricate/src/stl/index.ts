export { toStl, STL_FACET_BYTES, STL_HEADER_BYTES, type StlMesh, type StlOptions, type StlVec3 } from './toStl.ts';
export { stlHeader } from './stlHeader.ts';
