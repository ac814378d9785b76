import { batteryChemistries, chargeInputs, controllerTypes, deviceKinds } from '@gramwatt/shared';
import { useEffect, useRef } from 'react';
import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { newOutputPort, type ItemFormValues } from '../utils/item-form-values';
import {
  chargeInputLabels,
  chemistryLabels,
  controllerTypeLabels,
  deviceKindLabels,
  panelTypeLabels,
} from '../utils/labels';
import {
  CheckboxField,
  connectorOptions,
  FieldGroup,
  FieldRow,
  NumberField,
  PortFields,
  SelectField,
  useFieldError,
} from './form-fields';

function MassField({ optional = false }: { optional?: boolean }) {
  return (
    <NumberField
      name="spec.massG"
      label="Mass"
      unit="g"
      required={!optional}
      hint={
        optional
          ? 'Optional: a device is carried anyway, so its grams are not counted in kits.'
          : 'As packed, with any pouch.'
      }
    />
  );
}

/** Connectors a USB panel's port can have; a 12 V panel starting from one of these is given a DC barrel instead. */
const usbConnectors: readonly string[] = ['usb-a', 'usb-c', 'micro-usb'];

export function PanelFields() {
  const { control, getValues, setValue } = useFormContext<ItemFormValues>();
  const panelType = useWatch({ control, name: 'spec.panelType' });
  const shownType = useRef(panelType);
  useEffect(() => {
    // Only a change of type made in this form moves the port: a stored panel opens with its own connector.
    if (shownType.current === panelType) return;
    shownType.current = panelType;
    const isUsb = usbConnectors.includes(getValues('spec.outputPort.connector'));
    if (panelType === '12v' && isUsb) setValue('spec.outputPort.connector', 'barrel-5.5x2.1');
    if (panelType === 'usb' && !isUsb) setValue('spec.outputPort.connector', 'usb-a');
  }, [panelType, getValues, setValue]);
  return (
    <>
      <FieldGroup legend="Rating">
        <SelectField
          name="spec.panelType"
          label="Panel type"
          options={[
            { value: 'usb', label: `${panelTypeLabels.usb}: a regulated USB output` },
            { value: '12v', label: `${panelTypeLabels['12v']}: about 18 V at maximum power, for a charge controller` },
          ]}
        />
        <FieldRow>
          <NumberField name="spec.ratedW" label="Rated power" unit="W" required hint="The label's figure at STC." />
          <MassField />
        </FieldRow>
        {panelType === '12v' ? (
          <>
            <FieldRow>
              <NumberField
                name="spec.maxPowerVolts"
                label="Maximum-power voltage"
                unit="V"
                required
                hint="Vmp on the datasheet, at STC; about 17–18 V for a 12 V panel."
              />
              <NumberField
                name="spec.maxPowerAmps"
                label="Maximum-power current"
                unit="A"
                required
                hint="Imp at STC; Vmp × Imp is close to the rated power."
              />
            </FieldRow>
            <FieldRow>
              <NumberField
                name="spec.openCircuitVolts"
                label="Open-circuit voltage"
                unit="V"
                required
                hint="Voc at STC; about 21–22 V. It rises in the cold: the controller must take it."
              />
              <NumberField name="spec.shortCircuitAmps" label="Short-circuit current" unit="A" hint="Isc, if given." />
            </FieldRow>
          </>
        ) : (
          <FieldRow>
            <NumberField name="spec.portVolts" label="USB port voltage" unit="V" required />
            <NumberField name="spec.portMaxA" label="USB port maximum current" unit="A" required />
          </FieldRow>
        )}
        <FieldRow>
          <NumberField
            name="spec.dropoutIrradianceWm2"
            label="Dropout irradiance"
            unit="W/m²"
            hint="Below this light the regulator cuts out. 0 if unknown."
          />
          <NumberField
            name="spec.tempCoeffPctPerC"
            label="Temperature coefficient of power"
            unit={'%\u2060/\u2060°C'}
            hint="Negative: power falls as the cells warm. About −0.4 for crystalline silicon."
          />
        </FieldRow>
        {panelType === '12v' && (
          <NumberField
            name="spec.tempCoeffVocPctPerC"
            label="Temperature coefficient of open-circuit voltage"
            unit={'%\u2060/\u2060°C'}
            hint="Negative: Voc rises as the cells cool. About −0.3 for crystalline silicon."
          />
        )}
      </FieldGroup>
      <PortFields name="spec.outputPort" legend="Output port" />
    </>
  );
}

export function BatteryFields() {
  return (
    <>
      <FieldGroup
        legend="Pack"
        hint="A 12 V pack for the 12 V path: the cells, their chemistry and the Ah on the label."
      >
        <FieldRow>
          <SelectField
            name="spec.chemistry"
            label="Chemistry"
            options={batteryChemistries.map((chemistry) => ({ value: chemistry, label: chemistryLabels[chemistry] }))}
          />
          <NumberField
            name="spec.cellsInSeries"
            label="Cells in series"
            unit="cells"
            required
            hint="4 for a 12.8 V LiFePO4 pack, 3 for an 11.1 V LiPo, 6 for a 12 V lead-acid battery."
          />
        </FieldRow>
        <FieldRow>
          <NumberField name="spec.capacityAh" label="Capacity" unit="Ah" required />
          <MassField />
        </FieldRow>
      </FieldGroup>
      <FieldGroup
        legend="Maker's ratings"
        hint="Leave empty when the maker gives none: a typical charge rate for the chemistry is used instead."
      >
        <FieldRow>
          <NumberField
            name="spec.chargeCRate"
            label="Charge rate"
            unit="C"
            hint="The most it may be charged at; 0.5 C on a 6 Ah pack is 3 A."
          />
          <NumberField
            name="spec.dischargeCRate"
            label="Continuous discharge rate"
            unit="C"
            hint="The most it may give without pause."
          />
        </FieldRow>
        <FieldRow>
          <NumberField
            name="spec.ratedHours"
            label="Rated over"
            unit="h"
            hint="The hours the Ah figure is rated over; 20 for most lead-acid batteries."
          />
          <NumberField
            name="spec.peukertExponent"
            label="Peukert exponent"
            unit="—"
            hint="From the maker's rate table, if you have worked it out."
          />
        </FieldRow>
      </FieldGroup>
      <PortFields name="spec.port" legend="Terminal" />
    </>
  );
}

export function ControllerFields() {
  return (
    <>
      <FieldGroup legend="Charge controller" hint="Sits between a 12 V panel and a battery.">
        <SelectField
          name="spec.controllerType"
          label="Type"
          options={controllerTypes.map((type) => ({
            value: type,
            label:
              type === 'pwm'
                ? `${controllerTypeLabels.pwm}: pulls the panel down to the battery's voltage`
                : `${controllerTypeLabels.mppt}: tracks the panel's maximum power`,
          }))}
        />
        <FieldRow>
          <NumberField
            name="spec.maxInputVolts"
            label="Input voltage limit"
            unit="V"
            required
            hint="The highest panel voltage it takes; a cold panel's open-circuit voltage must stay below it."
          />
          <NumberField name="spec.maxChargeA" label="Charge current limit" unit="A" required />
        </FieldRow>
        <FieldRow>
          <NumberField
            name="spec.efficiency"
            label="Efficiency"
            unit="%"
            percent
            hint="Used for MPPT; about 95 % is common."
          />
          <MassField />
        </FieldRow>
      </FieldGroup>
      <PortFields name="spec.inputPort" legend="Panel input" />
      <PortFields name="spec.outputPort" legend="Battery output" />
    </>
  );
}

function OutputPortsFields() {
  const { control } = useFormContext<ItemFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: 'spec.outputPorts' });
  const listError = useFieldError('spec.outputPorts');
  return (
    <FieldGroup legend="Output ports" hint="Every port that can charge something, with its voltage and its limit.">
      <ol className="flex flex-col gap-4">
        {fields.map((field, index) => (
          <li key={field.id} className="rounded-lg border-2 border-firn-200 bg-firn-50 p-4">
            <div className="mb-3 flex items-center justify-between gap-2">
              <p className="font-medium text-scree-900">Output port {index + 1}</p>
              {fields.length > 1 && (
                <Button
                  variant="quiet"
                  size="sm"
                  onClick={() => remove(index)}
                  aria-label={`Remove output port ${index + 1}`}
                >
                  Remove
                </Button>
              )}
            </div>
            <div className="grid gap-4 sm:grid-cols-2">
              <SelectField
                name={`spec.outputPorts.${index}.connector`}
                label={`Port ${index + 1}: connector`}
                options={connectorOptions}
              />
              <div className="sm:pt-8">
                <CheckboxField name={`spec.outputPorts.${index}.captiveCable`} label="Captive cable" />
              </div>
              <NumberField
                name={`spec.outputPorts.${index}.volts`}
                label={`Port ${index + 1}: voltage`}
                unit="V"
                required
              />
              <NumberField
                name={`spec.outputPorts.${index}.maxA`}
                label={`Port ${index + 1}: maximum current`}
                unit="A"
                required
              />
              <NumberField
                name={`spec.outputPorts.${index}.usbPdVolts`}
                label={`Port ${index + 1}: USB PD voltages`}
                unit="V"
                hint="For a USB-C port with Power Delivery, e.g. 9, 12, 15. Leave empty otherwise."
                className="sm:col-span-2"
              />
            </div>
          </li>
        ))}
      </ol>
      {listError && <p className="text-sm font-medium text-rosehip-700">{listError}</p>}
      {fields.length < 8 && (
        <div>
          <Button variant="secondary" size="sm" onClick={() => append(newOutputPort())}>
            Add an output port
          </Button>
        </div>
      )}
    </FieldGroup>
  );
}

export function BankFields() {
  const { control, register } = useFormContext<ItemFormValues>();
  const capacityUnit = useWatch({ control, name: 'capacityUnit' });
  return (
    <>
      <FieldGroup legend="Capacity">
        <div role="radiogroup" aria-label="Capacity given in" className="flex flex-wrap gap-x-6 gap-y-2">
          {(
            [
              ['mah', 'mAh at the cell voltage'],
              ['wh', 'Wh'],
            ] as const
          ).map(([value, label]) => (
            <label key={value} className="flex items-center gap-2 text-sm font-medium text-scree-900">
              <input type="radio" value={value} className="size-4 accent-moss-700" {...register('capacityUnit')} />
              {label}
            </label>
          ))}
        </div>
        {capacityUnit === 'wh' ? (
          <NumberField name="spec.capacityWh" label="Rated energy" unit="Wh" required />
        ) : (
          <FieldRow>
            <NumberField name="spec.capacityMah" label="Rated capacity" unit="mAh" required />
            <NumberField
              name="spec.cellVolts"
              label="Cell voltage"
              unit="V"
              hint="The voltage the mAh figure is given at; 3.6–3.7 V for lithium-ion cells."
            />
          </FieldRow>
        )}
        <FieldRow>
          <NumberField
            name="spec.outputEfficiency"
            label="Output efficiency"
            unit="%"
            percent
            hint="Share of the stored energy that reaches the ports; about 85 % is common."
          />
          <NumberField
            name="spec.chargeEfficiency"
            label="Charge efficiency"
            unit="%"
            percent
            hint="Share of the input that ends up stored."
          />
        </FieldRow>
        <MassField />
      </FieldGroup>
      <FieldGroup legend="Input">
        <NumberField
          name="spec.inputMaxW"
          label="Input limit"
          unit="W"
          required
          hint="The most it takes while charging."
        />
      </FieldGroup>
      <PortFields name="spec.inputPort" legend="Input port" />
      <OutputPortsFields />
    </>
  );
}

export function ConverterFields() {
  return (
    <>
      <FieldGroup legend="Conversion">
        <SelectField
          name="spec.converterType"
          label="Type"
          options={[
            { value: 'boost', label: 'Boost: USB (5 V or a USB PD voltage) up to 12–13.8 V' },
            { value: '12v-to-usb', label: '12 V to USB adapter' },
          ]}
        />
        <FieldRow>
          <NumberField name="spec.inputVolts" label="Input voltage" unit="V" required />
          <NumberField name="spec.outputVolts" label="Output voltage" unit="V" required />
        </FieldRow>
        <FieldRow>
          <NumberField name="spec.maxOutputA" label="Maximum output current" unit="A" required />
          <NumberField name="spec.efficiency" label="Efficiency" unit="%" percent hint="About 85 % is common." />
        </FieldRow>
        <MassField />
      </FieldGroup>
      <PortFields name="spec.inputPort" legend="Input port" />
      <PortFields name="spec.outputPort" legend="Output port" />
    </>
  );
}

export function LeadFields() {
  return (
    <>
      <FieldGroup legend="Ends and length">
        <FieldRow>
          <SelectField name="spec.fromConnector" label="From connector" options={connectorOptions} />
          <SelectField name="spec.toConnector" label="To connector" options={connectorOptions} />
        </FieldRow>
        <FieldRow>
          <NumberField name="spec.lengthM" label="Length" unit="m" required hint="One way, end to end." />
          <MassField />
        </FieldRow>
      </FieldGroup>
      <FieldGroup
        legend="DC wiring"
        hint="For a 12 V lead: its copper gauge and inline fuse. Fuse the positive wire close to the battery."
      >
        <FieldRow>
          <NumberField name="spec.gaugeAwg" label="Wire gauge" unit="AWG" hint="Smaller numbers are thicker wire." />
          <NumberField name="spec.fuseA" label="Inline fuse" unit="A" />
        </FieldRow>
      </FieldGroup>
    </>
  );
}

function UseProfileFields() {
  const { control } = useFormContext<ItemFormValues>();
  const basis = useWatch({ control, name: 'spec.useProfile.basis' });
  const deviceKind = useWatch({ control, name: 'spec.deviceKind' });
  const basisOptions = [
    ...(deviceKind === 'radio' ? [{ value: 'radio-hours', label: 'Transmit, receive and standby time' }] : []),
    { value: 'battery-share', label: 'Share of its battery' },
    { value: 'energy', label: 'Energy' },
  ];
  return (
    <FieldGroup legend="A usual day" hint="The default use per day; a trip can change it for each device.">
      <SelectField name="spec.useProfile.basis" label="Measured as" options={basisOptions} />
      {basis === 'radio-hours' && (
        <div className="grid gap-4 sm:grid-cols-3">
          <NumberField name="spec.useProfile.transmitMinutesPerDay" label="Transmit time" unit="min/day" required />
          <NumberField name="spec.useProfile.receiveHoursPerDay" label="Receive time" unit="h/day" required />
          <NumberField name="spec.useProfile.standbyHoursPerDay" label="Standby time" unit="h/day" required />
        </div>
      )}
      {basis === 'battery-share' && (
        <NumberField
          name="spec.useProfile.batterySharePerDay"
          label="Battery used per day"
          unit="%"
          required
          hint="60 means it uses 60 % of its own battery a day; above 100 means more than one full charge."
        />
      )}
      {basis === 'energy' && (
        <NumberField name="spec.useProfile.energyWhPerDay" label="Energy per day" unit="Wh" required />
      )}
    </FieldGroup>
  );
}

export function DeviceFields() {
  const { control, getValues, setValue } = useFormContext<ItemFormValues>();
  const deviceKind = useWatch({ control, name: 'spec.deviceKind' });
  const chargesVia = useWatch({ control, name: 'spec.chargesVia' });
  const isRadio = deviceKind === 'radio';
  useEffect(() => {
    // Transmit hours are for radios only: another kind falls back to a share of its battery, and a new radio
    // starts from its talk time.
    const basis = getValues('spec.useProfile.basis');
    if (!isRadio && basis === 'radio-hours') setValue('spec.useProfile.basis', 'battery-share');
    if (isRadio && basis === 'battery-share' && getValues('spec.useProfile.batterySharePerDay') === '')
      setValue('spec.useProfile.basis', 'radio-hours');
  }, [isRadio, getValues, setValue]);
  return (
    <>
      <FieldGroup legend="Device">
        <FieldRow>
          <SelectField
            name="spec.deviceKind"
            label="What it is"
            options={deviceKinds.map((kind) => ({ value: kind, label: deviceKindLabels[kind] }))}
          />
          <NumberField name="spec.ownBatteryWh" label="Own battery" unit="Wh" required hint="0 if it has none." />
        </FieldRow>
        <MassField optional />
      </FieldGroup>
      <FieldGroup legend="Charging" hint="Give the charge power or the charge current.">
        <SelectField
          name="spec.chargesVia"
          label="Charges by"
          options={chargeInputs.map((input) => ({ value: input, label: chargeInputLabels[input] }))}
        />
        <FieldRow>
          <NumberField name="spec.chargePowerW" label="Charge power" unit="W" />
          <NumberField name="spec.chargeCurrentA" label="Charge current" unit="A" />
        </FieldRow>
        <FieldRow>
          {chargesVia === 'usb-pd' && (
            <NumberField name="spec.usbPdVolts" label="USB PD voltage it asks for" unit="V" hint="9 V if unsure." />
          )}
          <NumberField
            name="spec.chargeEfficiency"
            label="Charge efficiency"
            unit="%"
            percent
            hint="About 85 % is common."
          />
        </FieldRow>
      </FieldGroup>
      <PortFields name="spec.chargePort" legend="Charge port" />
      {isRadio && (
        <FieldGroup legend="Radio supply" hint="From the radio's manual: the DC window it accepts and what it draws.">
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberField name="spec.supplyVoltsNominal" label="Nominal supply" unit="V" required />
            <NumberField name="spec.supplyVoltsMin" label="Lowest supply" unit="V" />
            <NumberField name="spec.supplyVoltsMax" label="Highest supply" unit="V" />
          </div>
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberField name="spec.transmitCurrentA" label="Transmit current" unit="A" required />
            <NumberField name="spec.receiveCurrentA" label="Receive current" unit="A" required />
            <NumberField name="spec.standbyCurrentA" label="Standby current" unit="A" required />
          </div>
          <CheckboxField
            name="spec.canRunLive"
            label="Can run live from a 12 V pack"
            hint="It works while fed from a battery, not only charges from it."
          />
        </FieldGroup>
      )}
      <UseProfileFields />
    </>
  );
}
