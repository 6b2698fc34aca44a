'use client';
import { create } from 'zustand';
import type { EnergyUnit } from './energyUnits';

/** The unit the results view shows energies in; one choice for every table on the page. */
interface EnergyUnitState {
  unit: EnergyUnit;
  setUnit: (unit: EnergyUnit) => void;
}

export const useEnergyUnitStore = create<EnergyUnitState>((set) => ({
  unit: 'hartree',
  setUnit: (unit) => set({ unit }),
}));
