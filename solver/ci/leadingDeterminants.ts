/**
 * The "determinants" table: the largest coefficients of a CI vector in Ketbook's
 * occupation notation. Each determinant is written as two bit strings, alpha and beta,
 * one character per correlated orbital with orbital 0 first ("1" occupied, "0" empty):
 * the aufbau reference of 2 alpha and 2 beta electrons in 4 orbitals is
 * alpha "1100", beta "1100". The excitation level counts spin orbitals outside the
 * reference, both spins together.
 */
import { occupationBitString } from './bits';
import { CiSpace, determinantStrings } from './space';

export interface LeadingDeterminant {
  alpha: string;
  beta: string;
  coefficient: number;
  weight: number;
  excitationLevel: number;
  index: number;
}

export function leadingDeterminants(space: CiSpace, vector: Float64Array, count: number, threshold = 0): LeadingDeterminant[] {
  const order: number[] = [];
  for (let i = 0; i < vector.length; i++) if (Math.abs(vector[i]) >= threshold) order.push(i);
  order.sort((x, y) => Math.abs(vector[y]) - Math.abs(vector[x]) || x - y);
  return order.slice(0, count).map((index) => {
    const { alphaString, betaString } = determinantStrings(space, index);
    const c = vector[index];
    return {
      alpha: occupationBitString(space.alpha.patterns[alphaString], space.nOrbitals),
      beta: occupationBitString(space.beta.patterns[betaString], space.nOrbitals),
      coefficient: c,
      weight: c * c,
      excitationLevel: space.alpha.classes[space.alpha.classOf[alphaString]].excitation + space.beta.classes[space.beta.classOf[betaString]].excitation,
      index,
    };
  });
}
