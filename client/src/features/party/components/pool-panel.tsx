import type { PoolItem, TripRole } from '@gramwatt/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Select, type SelectOption } from '@/components/ui/select';
import { Spinner } from '@/components/ui/spinner';
import { useMyPowerGear } from '../api/get-my-power-gear';
import { usePool } from '../api/get-pool';
import { useRemovePoolItem } from '../api/remove-pool-item';
import { useShareToPool } from '../api/share-to-pool';
import { useUpdatePoolItem } from '../api/update-pool-item';

export interface PoolPanelProps {
  tripId: string;
  myAccountId: string | undefined;
  myRole: TripRole;
}

/** Power gear in the pool by what it does on the trail (our power roles), in words rather than colours. */
const kindWords: Record<PoolItem['kind'], string> = {
  panel: 'panel (collect)',
  bank: 'bank (store)',
  converter: 'converter (convert)',
  lead: 'lead (connect)',
  battery: 'battery (store)',
  controller: 'controller (convert)',
};

/** Counts 1…n as choices; a count above what is owned now (the locker was lowered) stays choosable. */
const countOptions = (countOwned: number, current = 1): SelectOption<string>[] =>
  Array.from({ length: Math.max(countOwned, current, 1) }, (_, i) => ({ value: String(i + 1), label: String(i + 1) }));

const grams = (massG: number) => `${massG.toLocaleString('en-GB')} g`;

type Outcome = { tone: 'done' | 'error'; text: string };

function PoolRow({
  tripId,
  item,
  canChange,
  onOutcome,
}: {
  tripId: string;
  item: PoolItem;
  canChange: boolean;
  onOutcome: (outcome: Outcome) => void;
}) {
  const update = useUpdatePoolItem();
  const remove = useRemovePoolItem();
  const countId = useId();
  const shownCount = update.isPending ? update.variables.data.count : item.count;
  return (
    <li className="flex flex-col gap-2 rounded-lg border-2 border-scree-200 bg-white p-3 sm:flex-row sm:items-center sm:justify-between">
      <div className="min-w-0">
        <p className="font-medium break-words text-scree-950">{item.name}</p>
        <p className="text-sm text-scree-700">
          {kindWords[item.kind]} · {grams(item.massG)} each
          {item.count > item.countOwned &&
            ` · only ${item.countOwned} left in the locker, so the plan uses ${item.countOwned}`}
        </p>
      </div>
      {canChange ? (
        <div className="flex flex-wrap items-center gap-2">
          <label htmlFor={countId} className="text-sm font-medium text-scree-900">
            How many<span className="sr-only"> of {item.name}</span>
          </label>
          <Select
            id={countId}
            options={countOptions(item.countOwned, item.count)}
            value={String(shownCount)}
            disabled={update.isPending}
            onValueChange={(value) =>
              update.mutate(
                { tripId, poolItemId: item.id, data: { count: Number(value) } },
                { onError: (error) => onOutcome({ tone: 'error', text: `${item.name}: ${error.message}` }) },
              )
            }
            className="min-h-10 w-20"
          />
          <Button
            variant="quiet"
            size="sm"
            isLoading={remove.isPending}
            onClick={() =>
              remove.mutate(
                { tripId, poolItemId: item.id },
                {
                  onSuccess: () =>
                    onOutcome({ tone: 'done', text: `${item.name} is out of the pool; it stays in the locker.` }),
                  onError: (error) => onOutcome({ tone: 'error', text: `${item.name}: ${error.message}` }),
                },
              )
            }
          >
            Take out<span className="sr-only"> {item.name}</span>
          </Button>
        </div>
      ) : (
        <p className="text-scree-800">× {item.count}</p>
      )}
    </li>
  );
}

/** The share form: one of my panels, banks, converters or leads not yet in the pool, and how many. */
function ShareForm({
  tripId,
  pooledItemIds,
  onOutcome,
}: {
  tripId: string;
  pooledItemIds: Set<string>;
  onOutcome: (o: Outcome) => void;
}) {
  const gear = useMyPowerGear();
  const share = useShareToPool();
  const [itemId, setItemId] = useState('');
  const [count, setCount] = useState('1');
  const itemFieldId = useId();
  const countFieldId = useId();

  if (gear.isPending) return <Spinner label="Loading your locker" />;
  if (gear.isError)
    return (
      <Alert tone="error" title="Your locker could not be loaded">
        {gear.error.message}
      </Alert>
    );
  const choices = gear.data.filter((item) => !pooledItemIds.has(item.id));
  if (gear.data.length === 0)
    return <p className="text-scree-700">Your locker has no panels, banks, converters or leads to share yet.</p>;
  if (choices.length === 0)
    return <p className="text-scree-700">Everything in your locker that can be shared is in the pool.</p>;

  const chosen = choices.find((item) => item.id === itemId) ?? choices[0]!;
  const submit = () =>
    share.mutate(
      { tripId, data: { itemId: chosen.id, count: Number(count) } },
      {
        onSuccess: (item) => {
          setCount('1');
          setItemId('');
          onOutcome({ tone: 'done', text: `${item.name} × ${item.count} shared with the party.` });
        },
        onError: (error) => onOutcome({ tone: 'error', text: error.message }),
      },
    );

  return (
    <div className="flex flex-wrap items-end gap-2">
      <div className="flex min-w-0 flex-col gap-1.5">
        <label htmlFor={itemFieldId} className="text-sm font-medium text-scree-900">
          Share from your locker
        </label>
        <Select
          id={itemFieldId}
          options={choices.map((item) => ({ value: item.id, label: `${item.name} (${grams(item.massG)})` }))}
          value={chosen.id}
          onValueChange={(value) => {
            setItemId(value);
            setCount('1');
          }}
          className="min-h-11 w-full max-w-80"
        />
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={countFieldId} className="text-sm font-medium text-scree-900">
          How many
        </label>
        <Select
          id={countFieldId}
          options={countOptions(chosen.countOwned)}
          value={count}
          onValueChange={setCount}
          className="min-h-11 w-20"
        />
      </div>
      <Button onClick={submit} isLoading={share.isPending}>
        Share with the party
      </Button>
    </div>
  );
}

/**
 * The party pool: power gear members bring for everyone, grouped by owner with the grams per unit. Leader and
 * partners share their own gear and change or take out their own entries (the leader any); viewers read.
 */
export function PoolPanel({ tripId, myAccountId, myRole }: PoolPanelProps) {
  const pool = usePool(tripId);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const canShare = myRole !== 'viewer';

  const body = () => {
    if (pool.isPending) return <Spinner label="Loading the shared gear" />;
    if (pool.isError)
      return (
        <Alert tone="error" title="The shared gear could not be loaded">
          {pool.error.message}
        </Alert>
      );
    const { items, leaderWholeLocker } = pool.data;
    const owners = [...new Set(items.map((item) => item.ownerAccountId))];
    const totalG = items.reduce((sum, item) => sum + item.massG * Math.min(item.count, item.countOwned), 0);
    return (
      <>
        {leaderWholeLocker && (
          <p className="text-sm text-scree-700">
            The leader has shared nothing yet, so the plan may draw on anything in the leader&rsquo;s locker. Once the
            leader shares an item, only what is listed here counts.
          </p>
        )}
        {items.length === 0 ? (
          <p className="text-scree-700">Nothing shared yet.</p>
        ) : (
          <>
            <p className="text-scree-800">{grams(totalG)} of power gear in the pool — the plan picks from it.</p>
            {owners.map((ownerId) => {
              const own = items.filter((item) => item.ownerAccountId === ownerId);
              const ownerName = ownerId === myAccountId ? 'You' : (own[0]?.ownerName ?? 'Someone');
              return (
                <div key={ownerId} className="flex flex-col gap-2">
                  <h3 className="text-sm font-semibold text-scree-800">{ownerName} brought</h3>
                  <ul
                    aria-label={`Shared by ${ownerName === 'You' ? 'you' : ownerName}`}
                    className="flex flex-col gap-2"
                  >
                    {own.map((item) => (
                      <PoolRow
                        key={item.id}
                        tripId={tripId}
                        item={item}
                        canChange={myRole === 'leader' || (canShare && ownerId === myAccountId)}
                        onOutcome={setOutcome}
                      />
                    ))}
                  </ul>
                </div>
              );
            })}
          </>
        )}
        {canShare && (
          <ShareForm
            tripId={tripId}
            pooledItemIds={new Set(items.filter((i) => i.ownerAccountId === myAccountId).map((i) => i.itemId))}
            onOutcome={setOutcome}
          />
        )}
      </>
    );
  };

  return (
    <section aria-labelledby="party-pool-heading" className="flex flex-col gap-3">
      <h2 id="party-pool-heading" className="text-lg font-semibold text-scree-900">
        Shared gear
      </h2>
      <div aria-live="polite">{outcome && <Alert tone={outcome.tone}>{outcome.text}</Alert>}</div>
      {body()}
    </section>
  );
}
