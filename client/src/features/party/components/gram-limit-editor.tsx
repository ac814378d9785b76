import { gramLimitGSchema } from '@gramwatt/shared';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

export interface GramLimitEditorProps {
  /** Whose limit, for the label read by screen readers ("Gram limit for Tobin"). */
  memberName: string;
  gramLimitG: number | null;
  isSaving: boolean;
  /** Server-side problem with the last save, shown under the field. */
  serverError?: string;
  onSave: (gramLimitG: number | null) => void;
}

/** Typed text → grams or null (blank means no limit), or the schema's message. */
export function parseGramLimit(text: string): { ok: true; value: number | null } | { ok: false; message: string } {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: true, value: null };
  const parsed = gramLimitGSchema.safeParse(Number(trimmed.replace(',', '.')));
  if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Not a gram limit' };
  return { ok: true, value: parsed.data };
}

/** The leader sets one person's gram limit for carried power gear; blank clears it. */
export function GramLimitEditor({ memberName, gramLimitG, isSaving, serverError, onSave }: GramLimitEditorProps) {
  const [text, setText] = useState(gramLimitG === null ? '' : String(gramLimitG));
  const [error, setError] = useState<string | undefined>();
  const saved = gramLimitG === null ? '' : String(gramLimitG);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const result = parseGramLimit(text);
    if (!result.ok) return setError(result.message);
    setError(undefined);
    onSave(result.value);
  };

  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-start gap-2">
      <TextField
        label={
          <span>
            Gram limit<span className="sr-only"> for {memberName}</span>
          </span>
        }
        hint="Power gear this person carries. Leave blank for no own limit."
        unit="g"
        inputMode="numeric"
        placeholder="No limit"
        value={text}
        onChange={(event) => setText(event.target.value)}
        error={error ?? serverError}
        className="w-full max-w-56"
      />
      <Button
        type="submit"
        variant="secondary"
        size="md"
        className="sm:mt-7"
        isLoading={isSaving}
        disabled={text.trim() === saved}
      >
        Save limit<span className="sr-only"> for {memberName}</span>
      </Button>
    </form>
  );
}
