import { cn } from '@/components/ui/cn';
import type { PlanCaution } from '../api/types';

const severityWords: Record<string, string> = { danger: 'Do not', warning: 'Take care', info: 'Good to know' };
const severityRule: Record<string, string> = {
  danger: 'border-rosehip-700',
  warning: 'border-larch-600',
  info: 'border-scree-300',
};

/** Said on every plan whether or not the server lists it: the figures are estimates. */
export const estimatesNote =
  'These figures are estimates, not a guarantee: carry a margin, and defer to the maker of each item, local rules and licensed practice.';

/**
 * The cautions that apply to this kit, the most serious first, each with its weight in words; the estimates note
 * closes the list even when the server left it out.
 */
export function CautionsList({ cautions }: { cautions: readonly PlanCaution[] }) {
  const hasEstimates = cautions.some((c) => c.id === 'estimates');
  const shown = hasEstimates ? cautions : [...cautions, { id: 'estimates', severity: 'info', text: estimatesNote }];
  return (
    <ul className="flex flex-col gap-2">
      {shown.map((caution) => (
        <li
          key={caution.id}
          className={cn(
            'rounded-r-lg border-l-4 bg-white py-2 pr-3 pl-3 text-scree-900',
            severityRule[caution.severity] ?? 'border-scree-300',
          )}
        >
          <span className="font-semibold">{severityWords[caution.severity] ?? 'Note'}: </span>
          {caution.text}
        </li>
      ))}
    </ul>
  );
}
