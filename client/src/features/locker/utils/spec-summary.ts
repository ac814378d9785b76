import type { ItemSpec } from '@gramwatt/shared';
import { formatNumber, formatPercent } from './format';
import { chargeInputLabels, chemistryLabels, connectorLabels, controllerTypeLabels, deviceKindLabels } from './labels';

const n = formatNumber;

/**
 * The one line that tells items of a kind apart, with units: what the table shows beside the name.
 * A bank rated in mAh also shows its Wh at the cell voltage (mAh × V / 1000), the figure airlines ask for. A battery
 * shows its cells (4S = four in series) and Ah; its volts and Wh are the engine's to work out, not the table's.
 * @example specSummary({ kind: 'panel', ratedW: 10, portVolts: 5, portMaxA: 2, ... }) // '10 W · 5 V 2 A'
 */
export const specSummary = (spec: ItemSpec): string => {
  switch (spec.kind) {
    case 'panel':
      return spec.panelType === 'usb'
        ? `${n(spec.ratedW)} W · ${n(spec.portVolts)} V ${n(spec.portMaxA)} A`
        : `${n(spec.ratedW)} W 12 V · ${n(spec.maxPowerVolts)} V ${n(spec.maxPowerAmps)} A at max power · ${n(spec.openCircuitVolts)} V open circuit`;
    case 'battery':
      return `${chemistryLabels[spec.chemistry]} ${n(spec.cellsInSeries)}S · ${n(spec.capacityAh)} Ah`;
    case 'controller':
      return `${controllerTypeLabels[spec.controllerType]} · up to ${n(spec.maxInputVolts)} V in · ${n(spec.maxChargeA)} A charge`;
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
    case 'lead': {
      const gauge = spec.gaugeAwg !== undefined ? ` · ${n(spec.gaugeAwg)} AWG` : '';
      const fuse = spec.fuseA !== undefined ? ` · ${n(spec.fuseA)} A fuse` : '';
      return `${connectorLabels[spec.fromConnector]} → ${connectorLabels[spec.toConnector]} · ${n(spec.lengthM)} m${gauge}${fuse}`;
    }
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
