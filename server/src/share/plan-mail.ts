import type { SharedTrip } from '@gramwatt/shared';
import { type MailBlock, type RenderedMail, renderMail } from '../mail/mail-layout';

/** The caution every plan carries, whatever the kit. */
export const estimateCaution =
  'Figures are estimates, not a guarantee: carry a margin. Follow the manufacturer’s instructions, local rules and licensed practice.';

function formatPlace(latitudeDeg: number, longitudeDeg: number): string {
  const lat = `${Math.abs(latitudeDeg).toFixed(4)}° ${latitudeDeg >= 0 ? 'N' : 'S'}`;
  const lon = `${Math.abs(longitudeDeg).toFixed(4)}° ${longitudeDeg >= 0 ? 'E' : 'W'}`;
  return `${lat}, ${lon}`;
}

export interface PlanMailInput {
  trip: SharedTrip;
  leaderName: string;
  /** The read-only link, whole. */
  link: string;
  note?: string;
}

/** Subject, text and HTML of the "plan sent home" e-mail: dates, start point, party, devices, plan and link. */
export function planMail({ trip, leaderName, link, note }: PlanMailInput): RenderedMail & { subject: string } {
  const subject = `Trip plan: ${trip.name}, ${trip.startDate} to ${trip.endDate}`;
  const blocks: MailBlock[] = [
    { type: 'paragraph', text: `${leaderName} sent you the plan for "${trip.name}" so that someone at home holds it.` },
  ];
  if (note) blocks.push({ type: 'paragraph', text: `${leaderName} writes: ${note}` });
  blocks.push({
    type: 'facts',
    rows: [
      ['Dates', `${trip.startDate} to ${trip.endDate} (${trip.nights} ${trip.nights === 1 ? 'night' : 'nights'})`],
      ['Start point', formatPlace(trip.latitudeDeg, trip.longitudeDeg)],
      ['Local time', trip.timeZone],
      ['Party', trip.members.map((m) => `${m.displayName} (${m.role})`).join(', ')],
    ],
  });
  if (trip.devices.length > 0) {
    blocks.push({ type: 'heading', text: 'Devices on the trip' });
    blocks.push({
      type: 'list',
      items: trip.devices.map((d) => `${d.name} (${d.deviceKind}), carried by ${d.carrierName}`),
    });
  }
  blocks.push({ type: 'heading', text: 'Power plan' });
  if (trip.plan) {
    blocks.push({ type: 'paragraph', text: trip.plan.verdict });
    if (trip.plan.tripChanged)
      blocks.push({
        type: 'paragraph',
        text: 'The trip or its gear changed after this kit was chosen: the verdict is for the devices, use and gear it had then. Ask the leader to choose the kit again.',
      });
    if (trip.plan.earlierPlanner)
      blocks.push({
        type: 'paragraph',
        text: 'An earlier version of the planner judged this kit: the verdict may no longer be its answer. Ask the leader to choose the kit again.',
      });
    blocks.push({ type: 'paragraph', text: `Power gear: ${Math.round(trip.plan.kitMassG)} g in all.` });
    blocks.push({
      type: 'list',
      items: trip.plan.carriers.map(
        (c) =>
          `${c.name} carries ${c.items.map((i) => (i.count > 1 ? `${i.count} × ${i.name}` : i.name)).join(', ') || 'nothing'} (${Math.round(c.massG)} g)`,
      ),
    });
  } else {
    blocks.push({
      type: 'paragraph',
      text: 'No kit has been chosen yet. The link below shows the plan once the leader picks one.',
    });
  }
  blocks.push({ type: 'heading', text: 'Cautions' });
  blocks.push({ type: 'list', items: [...(trip.plan?.cautions ?? []), estimateCaution] });
  blocks.push({ type: 'link', label: 'Open the trip (read-only, no account needed)', url: link });
  blocks.push({
    type: 'paragraph',
    text: `The link works until ${trip.linkExpiresAt.slice(0, 16).replace('T', ' ')} UTC unless the leader revokes it, and always shows the trip as it stands.`,
  });
  return {
    subject,
    ...renderMail(subject, blocks, 'Sent from Gramwatt by the trip leader. You are on this trip as a viewer.'),
  };
}
