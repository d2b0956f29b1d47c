import { GAS_CATALOGUE, type GasId } from '../gas/gas-catalogue.js';

/** One caution printed on the card. */
export interface FillCardCaution {
  readonly code: string;
  readonly title: string;
  readonly text: string;
}

/**
 * The cautions for the filling table: the gas catalogue's own hazard note (so the card says what
 * the rest of the product says), the handling rules for its hazard, and the cylinder rules when
 * cylinders are used. They are reminders, not a safety procedure: local codes and licensed
 * practice come first.
 */
export function fillCardCautions(gasId: GasId, usesCylinders: boolean): FillCardCaution[] {
  const gas = GAS_CATALOGUE[gasId];
  const range = gas.hazard.flammableRangeInAir;
  const cautions: FillCardCaution[] = [];
  if (gas.hazard.flammable) {
    cautions.push({
      code: 'flammable-gas',
      title: `${gas.name} is flammable`,
      text: `${gas.hazard.note}${range ? ` (Limits: ${range.source}.)` : ''} Fill outdoors or with strong ventilation; no sparks, open flames, smoking or unbonded equipment near the filling table; earth the filler and the crew. Follow your local fire and gas codes and licensed practice; they take precedence over this card.`,
    });
  } else {
    cautions.push({
      code: 'asphyxiant-gas',
      title: `${gas.name}: never inhale it`,
      text: `${gas.hazard.note} Breathing it can cause asphyxiation without warning: never inhale it, and fill outdoors or in a ventilated space.`,
    });
  }
  if (gas.hazard.toxic) {
    cautions.push({ code: 'toxic-gas', title: `${gas.name} is toxic`, text: gas.hazard.note });
  }
  if (usesCylinders) {
    cautions.push({
      code: 'pressurised-cylinder',
      title: 'Cylinders',
      text: 'Gas cylinders hold very high pressure: chain them upright, use a regulator rated for the gas, open the valve slowly, never heat them, and close them when not filling.',
    });
  }
  return cautions;
}
