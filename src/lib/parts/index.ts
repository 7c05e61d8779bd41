/** Parts: the footprint contract, the footprint library and the part-kind contract. */
export { HEIGHT_CLASSES, rotate, posePins, poseBody, fitPose } from './footprint.ts';
export type { Offset, HeightClass, Shape, Marks, SpanRange, Footprint, Pose } from './footprint.ts';
export { getFootprint, footprintNames, isTwoLead, DIP_SIZES } from './library.ts';
export {
  KINDS,
  partPinNames,
  packagePins,
  isPolarized,
  leadOrder,
  defaultFootprintName,
  footprintFor,
  checkPart,
} from './kinds.ts';
export type { KindInfo } from './kinds.ts';
export { AXIAL_SPECS, RADIAL_SPECS } from './two-lead.ts';
