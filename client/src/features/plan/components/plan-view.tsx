import { lazy, Suspense, useEffect, useRef } from 'react';
import { Spinner } from '@/components/ui/spinner';
import type { PlanRecord } from '../api/types';
import { formatMoment, formatSeconds } from '../utils/format';
import { selectionOf } from '../utils/kit-selection';
import { CautionsList, estimatesNote } from './cautions-list';
import { ChooseKitButton } from './choose-kit-button';
import { DayStripSection } from './evaluation-parts';
import { GramPrices } from './gram-prices';
import { KitTable } from './kit-table';
import { LedgerTable } from './ledger-table';
import { NothingFeasible } from './nothing-feasible';
import { PathChoiceNote } from './path-choice-note';
import { PlanSection } from './plan-section';
import { SwapsList } from './swaps-list';
import { VerdictSentence } from './verdict-sentence';

// The chart library is the heaviest part of the page: it loads on its own once a plan is on screen.
const PlanCharts = lazy(() => import('./plan-charts').then((m) => ({ default: m.PlanCharts })));

const kitIntro: Record<PlanRecord['result']['status'], string> = {
  optimal: 'The lightest kit from the locker that keeps every device charged.',
  'over-limit': 'The lightest kit that works, though it is over the gram limit.',
  'best-so-far': 'A kit that works; the search ran out of time before it could rule out a lighter one.',
  'nothing-feasible': '',
};

export interface PlanViewProps {
  tripId: string;
  plan: PlanRecord;
  canChooseKit: boolean;
  /** Move the focus to the answer (after a solve the member asked for). */
  focusAnswer?: boolean;
}

/** A stored plan: the answer in a sentence, the day strip, the kit, charts, ledger, swaps, gram prices and cautions. */
export function PlanView({ tripId, plan, canChooseKit, focusAnswer = false }: PlanViewProps) {
  const answerRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (focusAnswer) answerRef.current?.focus();
  }, [focusAnswer, plan.id]);
  const { result } = plan;
  const { kit, evaluation } = result;

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="plan-answer" className="flex flex-col gap-2">
        <h2
          id="plan-answer"
          ref={answerRef}
          tabIndex={-1}
          className="text-lg font-semibold text-scree-950 focus:outline-none sm:text-2xl"
        >
          {result.headline}
        </h2>
        {evaluation && result.status === 'over-limit' && <VerdictSentence verdict={evaluation.verdict} size="md" />}
        <p className="text-sm text-scree-600">
          Solved {formatMoment(plan.createdAt)} in {formatSeconds(plan.durationMs)}. {estimatesNote}
        </p>
      </section>

      {result.nothingFeasible && (
        <PlanSection title="What is missing">
          <NothingFeasible answer={result.nothingFeasible} />
        </PlanSection>
      )}

      {evaluation && kit && (
        <div className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
          <DayStripSection evaluation={evaluation} />
          <PlanSection title="The kit" intro={kitIntro[result.status]}>
            <KitTable
              kit={kit}
              caption="The kit"
              unusedItemIds={evaluation.unusedItemIds}
              actions={
                canChooseKit && (
                  <ChooseKitButton tripId={tripId} planId={plan.id} source="optimum" selection={selectionOf(kit)} />
                )
              }
            />
            {result.pathChoice && <PathChoiceNote choice={result.pathChoice} />}
          </PlanSection>
        </div>
      )}

      {evaluation && (
        <PlanSection title="Through the trip">
          <Suspense fallback={<Spinner label="Loading the charts" />}>
            <PlanCharts evaluation={evaluation} />
          </Suspense>
        </PlanSection>
      )}

      {evaluation && (
        <PlanSection title="Ledger" intro="Each day's energy, in Wh; losses are charging, output and converter losses.">
          <LedgerTable ledgers={evaluation.ledgers} bindingSkyId={evaluation.bindingSkyId} />
        </PlanSection>
      )}

      {(result.swaps.length > 0 || result.gramPrices.length > 0) && (
        <div className="grid gap-8 lg:grid-cols-2">
          {result.swaps.length > 0 && (
            <PlanSection title="Swaps" intro="The next best kits from your locker, and what each changes.">
              <SwapsList tripId={tripId} planId={plan.id} swaps={result.swaps} canChooseKit={canChooseKit} />
            </PlanSection>
          )}
          {result.gramPrices.length > 0 && (
            <PlanSection title="What more would cost" intro="The grams each extra demand on the kit would add.">
              <GramPrices prices={result.gramPrices} />
            </PlanSection>
          )}
        </div>
      )}

      <PlanSection title="Cautions">
        <CautionsList cautions={evaluation?.cautions ?? []} />
      </PlanSection>

      {result.notes.length > 0 && (
        <PlanSection title="About this plan">
          <ul className="list-disc pl-5 text-sm text-scree-700">
            {result.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </PlanSection>
      )}
    </div>
  );
}
