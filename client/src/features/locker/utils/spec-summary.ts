import type { ItemSpec } from '@gramwatt/shared';
import { formatNumber, formatPercent } from './format';
import { chargeInputLabels, connectorLabels, deviceKindLabels } from './labels';

const n = formatNumber;

/**
 * The one line that tells items of a kind apart, with units: what the table shows beside the name.
 * A bank rated in mAh also shows its Wh at the cell voltage (mAh × V / 1000), the figure airlines ask for.
 * @example specSummary({ kind: 'panel', ratedW: 10, portVolts: 5, portMaxA: 2, ... }) // '10 W · 5 V 2 A'
 */
export const specSummary = (spec: ItemSpec): string => {
  switch (spec.kind) {
    case 'panel':
      return `${n(spec.ratedW)} W · ${n(spec.portVolts)} V ${n(spec.portMaxA)} A`;
    case 'bank': {
      const capacity =
        spec.capacityWh !== undefined
          ? `${n(spec.capacityWh)} Wh`
          : `${n(spec.capacityMah ?? 0)} mAh · ${n(((spec.capacityMah ?? 0) * spec.cellVolts) / 1000)} Wh`;
      const ports = spec.outputPorts.length === 1 ? '1 output' : `${spec.outputPorts.length} outputs`;
      return `${capacity} · in ${n(spec.inputMaxW)} W · ${ports}`;
    }
    case 'converter': {
      const what = spec.converterType === 'boost' ? 'Boost' : '12 V to USB';
      return `${what} ${n(spec.inputVolts)} → ${n(spec.outputVolts)} V · ${n(spec.maxOutputA)} A · ${formatPercent(spec.efficiency)}`;
    }
    case 'lead':
      return `${connectorLabels[spec.fromConnector]} → ${connectorLabels[spec.toConnector]} · ${n(spec.lengthM)} m`;
    case 'device': {
      const battery = `${n(spec.ownBatteryWh)} Wh battery`;
      const supply =
        spec.deviceKind === 'radio' && spec.supplyVoltsNominal !== undefined
          ? ` · ${n(spec.supplyVoltsNominal)} V supply`
          : '';
      return `${deviceKindLabels[spec.deviceKind]} · ${battery}${supply} · charges by ${chargeInputLabels[spec.chargesVia]}`;
    }
  }
};
