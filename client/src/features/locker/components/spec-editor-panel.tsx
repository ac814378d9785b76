import type { ItemSpec } from '@gramwatt/shared';
import type { z } from 'zod';
import { emptyItemFormValues, itemToFormValues } from '../utils/item-form-values';
import { ItemForm } from './item-form';
import { SidePanel } from './side-panel';

export interface SpecEditorPanelProps<Body> {
  open: boolean;
  title: string;
  /** The record to change, or undefined for a new one (which starts as a panel). */
  initial?: { id: string; name: string; notes: string; spec: ItemSpec };
  bodySchema: z.ZodType<Body>;
  submitLabel: string;
  onSubmit: (body: Body) => Promise<unknown>;
  onClose: () => void;
}

/**
 * The per-kind item form without counts or files, in a side panel: for gear records that are not locker items
 * (the reference catalogue).
 */
export function SpecEditorPanel<Body>({
  open,
  title,
  initial,
  bodySchema,
  submitLabel,
  onSubmit,
  onClose,
}: SpecEditorPanelProps<Body>) {
  return (
    <SidePanel open={open} onClose={onClose} title={title} description="Figures with units; shares in percent.">
      {open && (
        <ItemForm
          key={initial?.id ?? 'new'}
          initialValues={initial ? itemToFormValues(initial) : emptyItemFormValues('panel')}
          kindLocked={!!initial}
          showCount={false}
          bodySchema={bodySchema}
          submitLabel={submitLabel}
          onSubmit={onSubmit}
          onCancel={onClose}
        />
      )}
    </SidePanel>
  );
}
