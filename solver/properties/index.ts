export { mullikenCharges, nuclearCharge } from './mullikenCharges';
export { dipoleMomentDebye, type DipoleMoment } from './dipoleMoment';
