import type { MailDelivery } from '@gramwatt/shared';
import { Alert } from '@/components/ui/alert';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner } from '@/components/ui/spinner';
import { useMailDeliveries } from '../api/get-mail-deliveries';

const kindLabel: Record<MailDelivery['kind'], string> = { 'trip-invite': 'Trip invite', 'trip-plan': 'Plan sent home' };

const timeFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
const at = (iso: string | null) => (iso ? timeFormat.format(new Date(iso)) : '—');

/** Where the message stands, in words (never by colour alone). */
export function describeDelivery(
  message: Pick<MailDelivery, 'status' | 'attempts' | 'sentAt' | 'nextAttemptAt'>,
): string {
  const tries = `${message.attempts} ${message.attempts === 1 ? 'try' : 'tries'}`;
  switch (message.status) {
    case 'sent':
      return `Sent ${at(message.sentAt)} (${tries})`;
    case 'queued':
      return message.nextAttemptAt
        ? `Waiting; next try ${at(message.nextAttemptAt)} (${tries} so far)`
        : `Waiting (${tries} so far)`;
    case 'failed':
      return `Gave up after ${tries}`;
  }
}

/** The latest e-mails' delivery for admins: kind, recipient, status, tries, the last error. Never the content. */
export function MailDeliveryTable() {
  const deliveries = useMailDeliveries();
  if (deliveries.isPending) return <PageSpinner label="Loading mail delivery" />;
  if (deliveries.isError)
    return (
      <Alert tone="error" title="Mail delivery could not be loaded">
        {deliveries.error.message}
      </Alert>
    );
  if (deliveries.data.length === 0)
    return <EmptyState title="No mail sent yet">Invites and plans sent home will be listed here.</EmptyState>;
  return (
    <div
      tabIndex={0}
      role="region"
      aria-label="Mail delivery table"
      className="overflow-x-auto rounded-xl border-2 border-scree-200 bg-white shadow-card"
    >
      <table className="w-full border-collapse text-left text-sm max-md:block md:min-w-[48rem]">
        <caption className="sr-only">The latest e-mails, newest first, with their delivery status</caption>
        <thead className="bg-firn-100 text-scree-700 max-md:sr-only">
          <tr>
            <th scope="col" className="px-4 py-3 font-semibold">
              Queued
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              What
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              To
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Delivery
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Last error
            </th>
          </tr>
        </thead>
        <tbody className="divide-y-2 divide-firn-200 max-md:block">
          {deliveries.data.map((message) => (
            <tr
              key={message.id}
              className="align-top text-scree-900 max-md:flex max-md:flex-col max-md:gap-1 max-md:p-4"
            >
              <td className="px-4 py-3 whitespace-nowrap max-md:p-0 max-md:text-scree-600">{at(message.createdAt)}</td>
              <th scope="row" className="px-4 py-3 font-medium max-md:p-0">
                {kindLabel[message.kind]}
              </th>
              <td className="px-4 py-3 break-all max-md:p-0">{message.toAddress}</td>
              <td className="px-4 py-3 max-md:p-0">
                <span className={message.status === 'failed' ? 'font-semibold text-rosehip-800' : undefined}>
                  {describeDelivery(message)}
                </span>
              </td>
              <td className="px-4 py-3 break-words text-scree-700 max-md:p-0 max-md:empty:hidden">
                {message.lastError ?? ''}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
