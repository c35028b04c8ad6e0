import { get, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { FirmwareRulesDraftInput } from '@shared/schemas/admin-reference';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field-error';
import { CellCheckbox } from '@/components/ui/cell-checkbox';
import { Select } from '@/components/ui/select';
import { TextInput } from '@/components/ui/text-input';
import { cn } from '@/lib/cn';

// The kit's controls, narrowed to fit a table cell.
const cell = 'rounded-md px-2';
const blankIsUnset = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : typeof v === 'string' ? v.trim() : v);

interface Props {
  index: number;
  register: UseFormRegister<FirmwareRulesDraftInput>;
  errors: FieldErrors<FirmwareRulesDraftInput>;
  editable: boolean;
  onRemove: () => void;
}

/** One rule as a table row; each input is labelled with its column and rule number for screen readers. */
export function FirmwareRuleRow({ index, register, errors, editable, onRemove }: Props) {
  const base = `rules.${index}` as const;
  const input = (name: string, label: string, extra: object = {}) => {
    const path = `${base}.${name}`;
    const message = (get(errors, path) as { message?: string } | undefined)?.message;
    const errorId = `rule-${index}-${name}-error`;
    return (
      <td className="p-1.5 align-top">
        <TextInput
          aria-label={`Rule ${index + 1}: ${label}`}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? errorId : undefined}
          className={cell}
          {...register(path as `rules.${number}.key`, extra)}
        />
        <FieldError id={errorId} message={message} />
      </td>
    );
  };
  return (
    <tr className="border-t border-surface-line">
      {input('key', 'key')}
      {input('pressControl.from', 'press control from', { setValueAs: blankIsUnset })}
      {input('pressControl.before', 'press control before', { setValueAs: blankIsUnset })}
      {input('monitorModule.from', 'monitor module from', { setValueAs: blankIsUnset })}
      {input('monitorModule.before', 'monitor module before', { setValueAs: blankIsUnset })}
      <td className="p-1.5 align-top">
        <Select aria-label={`Rule ${index + 1}: works together`} className={cell} {...register(`${base}.compatible`, { setValueAs: (v: unknown) => v === true || v === 'true' })}>
          <option value="true">Compatible</option>
          <option value="false">Not compatible</option>
        </Select>
      </td>
      {input('note', 'note')}
      <td className="p-1.5 text-center align-top">
        <CellCheckbox label={`Rule ${index + 1}: invented demo rule`} registration={register(`${base}.invented`)} />
      </td>
      <td className={cn('p-1.5 align-top', !editable && 'hidden')}>
        <Button variant="quiet" onClick={onRemove} aria-label={`Remove rule ${index + 1}`}>
          Remove
        </Button>
      </td>
    </tr>
  );
}
