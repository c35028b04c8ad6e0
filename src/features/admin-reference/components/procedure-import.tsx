import { useId, useState, type ChangeEvent } from 'react';
import { procedureImportSchema, type ProcedureCheck } from '@shared/schemas/admin-reference';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { TextInput } from '@/components/ui/text-input';
import { Textarea } from '@/components/ui/textarea';
import { errorMessage } from '@/lib/api-error';
import { proceduresApi, useCheckProcedure } from '@/api/procedures';
import { ProcedureDiagram } from './procedure-diagram';
import { ProcedureProblems } from './procedure-problems';

type Parsed = { ok: true; key?: string; title?: string; definition: unknown } | { ok: false; error: string };

/** Accepts a whole procedure file ({ key, title, definition }) or just its definition. */
function parseJson(text: string): Parsed {
  try {
    const value: unknown = JSON.parse(text);
    if (value && typeof value === 'object' && 'definition' in value) {
      const v = value as { key?: unknown; title?: unknown; definition: unknown };
      return { ok: true, key: typeof v.key === 'string' ? v.key : undefined, title: typeof v.title === 'string' ? v.title : undefined, definition: v.definition };
    }
    return { ok: true, definition: value };
  } catch (error) {
    return { ok: false, error: `This is not valid JSON: ${(error as Error).message}. Check for a missing comma or quote.` };
  }
}

/** Paste or pick a procedure's JSON, run the validator, see the branching, then keep it as a draft. */
export function ProcedureImport({ onImported }: { onImported: (id: number) => void }) {
  const fileId = useId();
  const [text, setText] = useState('');
  const [key, setKey] = useState('');
  const [title, setTitle] = useState('');
  const [jsonError, setJsonError] = useState<string | null>(null);
  const [checkedText, setCheckedText] = useState<string | null>(null);
  const check = useCheckProcedure();
  const save = proceduresApi.useCreateDraft();
  const envelope = procedureImportSchema.pick({ key: true, title: true }).safeParse({ key, title });
  const fieldError = (name: 'key' | 'title') => (envelope.success || !checkedText ? undefined : envelope.error.issues.find((i) => i.path[0] === name)?.message);
  const result: ProcedureCheck | undefined = checkedText === text ? check.data : undefined;

  const runCheck = (source = text) => {
    const parsed = parseJson(source);
    if (!parsed.ok) {
      setJsonError(parsed.error);
      setCheckedText(null);
      return;
    }
    setJsonError(null);
    if (parsed.key && !key) setKey(parsed.key);
    if (parsed.title && !title) setTitle(parsed.title);
    setCheckedText(source);
    check.mutate(parsed.definition);
  };

  const onFile = async (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    if (!file) return;
    const content = await file.text();
    setText(content);
    runCheck(content);
  };

  const onSave = () => {
    const parsed = parseJson(text);
    if (!parsed.ok || !envelope.success) return;
    save.mutate({ key: envelope.data.key, title: envelope.data.title, definition: parsed.definition }, { onSuccess: (record) => onImported(record.id) });
  };

  return (
    <div className="space-y-6">
      <div className="space-y-1.5">
        <label htmlFor={fileId} className="block text-lg font-semibold text-ink">
          Procedure file (.json)
        </label>
        <input id={fileId} type="file" accept="application/json,.json" onChange={(e) => void onFile(e)} className="block min-h-touch text-lg text-ink file:mr-4 file:min-h-touch file:rounded-lg file:border-2 file:border-surface-edge file:bg-surface-raised file:px-4 file:text-lg file:font-semibold" />
      </div>
      <Field label="Or paste the JSON" error={jsonError ?? undefined}>
        <Textarea rows={12} value={text} onChange={(e) => setText(e.target.value)} spellCheck={false} className="font-mono text-base" />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Procedure key" hint="Lower-case words joined by hyphens; a new version is made under the same key" error={fieldError('key')}>
          <TextInput value={key} onChange={(e) => setKey(e.target.value)} autoCapitalize="none" spellCheck={false} />
        </Field>
        <Field label="Title" error={fieldError('title')}>
          <TextInput value={title} onChange={(e) => setTitle(e.target.value)} />
        </Field>
      </div>
      <div className="flex flex-wrap gap-3">
        <Button variant="secondary" onClick={() => runCheck()} disabled={text.trim() === '' || check.isPending}>
          {check.isPending ? 'Checking…' : 'Check'}
        </Button>
        <Button onClick={onSave} disabled={!result?.ok || !envelope.success || save.isPending}>
          {save.isPending ? 'Saving…' : 'Save as draft'}
        </Button>
      </div>
      {check.isError && (
        <Banner tone="error" role="alert" title="The check did not run">
          {errorMessage(check.error)}
        </Banner>
      )}
      {save.isError && (
        <Banner tone="error" role="alert" title="Not saved">
          {errorMessage(save.error)}
        </Banner>
      )}
      {result && <ProcedureProblems problems={result.problems} />}
      {result?.diagram && <ProcedureDiagram diagram={result.diagram} />}
    </div>
  );
}
