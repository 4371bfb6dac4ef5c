/**
 * Joints between parts (contacts.ts), the parts that act together and the overlaps (groups.ts).
 * For torsion of sections whose parts do not all act together, use partsActingTogether(doc).groups:
 * one region per group, each to be solved on its own and summed.
 */
export { findJoints, jointKindText, jointSettingFor, jointTolerance, JOINT_TOLERANCE_RATIO, type ContactSegment, type Joint } from './contacts.ts';
export { partOverlaps, partsActingTogether, OVERLAP_AREA_RATIO, SEPARATE_PIECES_NOTE, type ActingGroup, type ActingGroups, type PartOverlap } from './groups.ts';
export { separateTorsion, torsionByJointGroups, type GroupTorsion, type SeparateTorsion } from './torsion.ts';
export { jointShearFlows, type JointShearFlow, type ShearFlowResult, type ShearLoads, type TransformedSection } from './shear-flow.ts';
export { fastenerPitch, filletCapacityPerLength, intermittentFillet, minimumFilletLeg, requiredFilletLeg, FILLET_OMEGA, FILLET_PHI, type DesignMethod } from './weld.ts';
export { shearStressAt, shearStresses, shearStressProfile, SHEAR_CUTS_METHOD, type CutOrientation, type JointShear, type PartShear, type ShearCut, type ShearProfile, type ShearStressResult } from './shear-stress.ts';
export { plyShares, PLY_SHARE_NOTE, type PlyShare, type PlyShares } from './ply-share.ts';
