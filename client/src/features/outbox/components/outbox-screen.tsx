import { Tab, TabGroup, TabList, TabPanel, TabPanels } from '@headlessui/react';
import type { OutboxEntry } from '@gramwatt/shared';
import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { buttonClasses } from '@/components/ui/button';
import { cn } from '@/components/ui/cn';
import { EmptyState } from '@/components/ui/empty-state';
import { PageSpinner, Spinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { useOutbox } from '../api/get-outbox';
import { useOutboxMessage } from '../api/get-outbox-message';
import { appLinksIn } from '../utils/app-links';

const receivedFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export interface OutboxScreenProps {
  /** The open message's id, or null. */
  selectedId: string | null;
  /** Link to a message (the route keeps the choice in the address, so Back closes it). */
  hrefFor: (messageId: string | null) => string;
}

const tabClasses = ({ selected }: { selected: boolean }) =>
  cn(
    '-mb-0.5 min-h-10 border-b-4 px-3 text-sm font-medium focus:outline-none focus-visible:ring-2 focus-visible:ring-tarn-600',
    selected ? 'border-moss-600 text-scree-950' : 'border-transparent text-scree-600 hover:text-scree-900',
  );

function MessageView({ messageId, closeHref }: { messageId: string; closeHref: string }) {
  const query = useOutboxMessage(messageId);
  if (query.isPending) return <Spinner label="Opening the message" />;
  if (query.isError)
    return (
      <Alert tone="error" title="The message could not be opened">
        {query.error.message}
      </Alert>
    );
  const message = query.data;
  const links = appLinksIn(message.text);
  return (
    <article aria-labelledby="outbox-message-subject" className="flex min-w-0 flex-col gap-4">
      <header className="flex flex-col gap-1">
        <h2 id="outbox-message-subject" className="text-lg font-semibold break-words text-scree-950">
          {message.subject || '(no subject)'}
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm">
          <dt className="text-scree-600">From</dt>
          <dd className="break-all text-scree-900">{message.from}</dd>
          <dt className="text-scree-600">To</dt>
          <dd className="break-all text-scree-900">{message.to}</dd>
          <dt className="text-scree-600">Received</dt>
          <dd className="text-scree-900">{receivedFormat.format(new Date(message.receivedAt))}</dd>
        </dl>
      </header>
      {links.length > 0 && (
        <div className="flex flex-wrap gap-2">
          {links.map((link) => (
            <Link key={link.path} to={link.path} className={buttonClasses('primary')}>
              {link.label}
            </Link>
          ))}
        </div>
      )}
      <TabGroup>
        <TabList className="flex gap-1 border-b-2 border-scree-200" aria-label="How to show the message">
          <Tab className={tabClasses}>Plain text</Tab>
          {message.html && <Tab className={tabClasses}>As formatted</Tab>}
        </TabList>
        <TabPanels className="pt-3">
          <TabPanel>
            <pre className="font-sans text-sm leading-relaxed break-words whitespace-pre-wrap text-scree-900">
              {message.text}
            </pre>
          </TabPanel>
          {message.html && (
            <TabPanel>
              {/* An empty sandbox: no scripts, no forms, no navigation, no access to this page. */}
              <iframe
                title={`The formatted part of "${message.subject}"`}
                sandbox=""
                referrerPolicy="no-referrer"
                srcDoc={message.html}
                className="h-[32rem] w-full rounded-lg border-2 border-scree-200 bg-white"
              />
              <p className="mt-2 text-sm text-scree-600">
                Shown as the e-mail would look. Its links are switched off here: use the buttons above.
              </p>
            </TabPanel>
          )}
        </TabPanels>
      </TabGroup>
      <p>
        <Link
          to={closeHref}
          className="text-sm font-medium text-moss-700 underline decoration-2 underline-offset-2 lg:hidden"
        >
          Back to the list
        </Link>
      </p>
    </article>
  );
}

function EntryLink({ entry, selected, href }: { entry: OutboxEntry; selected: boolean; href: string }) {
  return (
    <Link
      to={href}
      aria-current={selected ? 'true' : undefined}
      className={cn(
        'block rounded-lg border-2 p-3 transition-colors',
        selected ? 'border-moss-600 bg-white' : 'border-transparent bg-white/60 hover:border-scree-300',
      )}
    >
      <span className="block font-medium break-words text-scree-950">{entry.subject || '(no subject)'}</span>
      <span className="block text-xs text-scree-600">
        To {entry.to} · {receivedFormat.format(new Date(entry.receivedAt))}
      </span>
      <span className="mt-1 line-clamp-2 block text-sm text-scree-700">{entry.preview}</span>
    </Link>
  );
}

/**
 * The messages the local mail server received for the signed-in account, newest first, and the one
 * opened beside them — so an invite sent in a demo can be followed without a real mailbox.
 */
export function OutboxScreen({ selectedId, hrefFor }: OutboxScreenProps) {
  const outbox = useOutbox();
  if (outbox.isPending) return <PageSpinner label="Loading your messages" />;
  if (outbox.isError)
    return (
      <Alert tone={isApiError(outbox.error, 404) ? 'info' : 'error'} title="No outbox to read">
        {isApiError(outbox.error, 404)
          ? 'This server sends mail to a real mail server, so messages are in your own mailbox instead.'
          : outbox.error.message}
      </Alert>
    );
  if (outbox.data.length === 0)
    return (
      <EmptyState title="Nothing for you yet">
        Invites and plans sent to your address show up here. Ask a trip leader to invite you, then look again.
      </EmptyState>
    );
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
      <nav aria-label="Messages" className={cn(selectedId && 'max-lg:hidden')}>
        <ul className="flex flex-col gap-2">
          {outbox.data.map((entry) => (
            <li key={entry.id}>
              <EntryLink entry={entry} selected={entry.id === selectedId} href={hrefFor(entry.id)} />
            </li>
          ))}
        </ul>
      </nav>
      <div className="min-w-0 rounded-xl border-2 border-scree-200 bg-white p-4 sm:p-5 max-lg:empty:hidden">
        {selectedId ? (
          <MessageView key={selectedId} messageId={selectedId} closeHref={hrefFor(null)} />
        ) : (
          <p className="text-scree-700 max-lg:hidden">Choose a message to read it.</p>
        )}
      </div>
    </div>
  );
}
