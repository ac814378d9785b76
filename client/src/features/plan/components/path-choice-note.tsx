import type { PlanResult } from '../api/types';

const pathLabels: Record<NonNullable<PlanResult['pathChoice']>['path'], string> = {
  pack: '12 V pack path',
  banks: 'Banks and boost converter',
  both: 'Both power paths',
};

export interface PathChoiceNoteProps {
  choice: NonNullable<PlanResult['pathChoice']>;
}

/** Which power path the kit gives the 12 V radio, and what the other path would weigh, in one short note. */
export function PathChoiceNote({ choice }: PathChoiceNoteProps) {
  return (
    <div role="note" aria-label="Power path" className="rounded-lg border-2 border-firn-200 bg-firn-50 px-3 py-2">
      <p className="text-xs font-semibold tracking-wide text-scree-600 uppercase">{pathLabels[choice.path]}</p>
      <p className="text-sm text-scree-900">{choice.text}</p>
    </div>
  );
}
