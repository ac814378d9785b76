import type { ItemKind } from '@gramwatt/shared';
import { useSaveLockerItem } from '../api/save-locker-item';
import { lockerItemInputSchema, type LockerItem } from '../api/types';
import { emptyItemFormValues, itemToFormValues } from '../utils/item-form-values';
import { kindLabels } from '../utils/labels';
import { ItemFiles } from './item-files';
import { ItemForm } from './item-form';
import { SidePanel } from './side-panel';

export type ItemPanelState = { mode: 'closed' } | { mode: 'add'; kind: ItemKind } | { mode: 'edit'; item: LockerItem };

export interface ItemPanelProps {
  state: ItemPanelState;
  onClose: () => void;
  onSaved: (item: LockerItem, wasNew: boolean) => void;
}

/** Add or change a locker item in a side panel; a saved item also gets its photo and spec sheet here. */
export function ItemPanel({ state, onClose, onSaved }: ItemPanelProps) {
  const save = useSaveLockerItem();
  const item = state.mode === 'edit' ? state.item : undefined;
  const title = item ? `Edit ${item.name}` : 'Add gear';
  return (
    <SidePanel
      open={state.mode !== 'closed'}
      onClose={onClose}
      title={title}
      description={
        item
          ? `${kindLabels[item.kind]}. Figures with units; shares in percent.`
          : 'Pick the kind, then fill in what its label or manual says. Figures with units; shares in percent.'
      }
    >
      {state.mode !== 'closed' && (
        <ItemForm
          // A fresh form for every item opened.
          key={item?.id ?? `new-${state.mode === 'add' ? state.kind : ''}`}
          initialValues={
            item ? itemToFormValues(item) : emptyItemFormValues(state.mode === 'add' ? state.kind : 'panel')
          }
          kindLocked={!!item}
          showCount
          bodySchema={lockerItemInputSchema}
          submitLabel={item ? 'Save changes' : 'Add to locker'}
          onSubmit={async (body) => {
            const saved = await save.mutateAsync({ itemId: item?.id, body });
            onSaved(saved, !item);
          }}
          onCancel={onClose}
        >
          {item && <ItemFiles item={item} />}
        </ItemForm>
      )}
    </SidePanel>
  );
}
