import { RadioChips } from '@/components/ui/radio-chips';
import type { ReactNode } from 'react';
import type { StepInput } from '@shared/schemas/procedure';
import type { BandSetRecord } from '@shared/schemas/visit-detail';
import { Field } from '@/components/ui/field';
import { Select } from '@/components/ui/select';
import { TextInput } from '@/components/ui/text-input';

interface StepInputFieldsProps {
  inputs: StepInput[];
  values: Record<string, string>;
  errors: Record<string, string | undefined>;
  onChange: (key: string, value: string) => void;
  bandSets: BandSetRecord[];
  /** Where a photo input is asked for, the page puts its photo panel. */
  renderPhotos: (prompt: string) => ReactNode;
  disabled: boolean;
}

/** The typed inputs a step asks for alongside its outcome. */
export function StepInputFields({ inputs, values, errors, onChange, bandSets, renderPhotos, disabled }: StepInputFieldsProps) {
  return (
    <div className="space-y-4">
      {inputs.map((input) => {
        const label = input.required ? input.label : `${input.label} (optional)`;
        if (input.type === 'photo') return <div key={input.key}>{renderPhotos(input.label)}</div>;
        if (input.type === 'yes_no') {
          return (
            <YesNoField key={input.key} label={label} value={values[input.key] ?? ''} error={errors[input.key]} disabled={disabled} onChange={(v) => onChange(input.key, v)} />
          );
        }
        if (input.type === 'sensor_generation') {
          return (
            <Field key={input.key} label={label} error={errors[input.key]}>
              <Select
                fit="medium"
                value={values[input.key] ?? ''}
                disabled={disabled}
                onChange={(e) => onChange(input.key, e.target.value)}
                options={bandSets.map((b) => ({ value: b.generation, label: b.label }))}
              >
                <option value="">Not chosen</option>
              </Select>
            </Field>
          );
        }
        return (
          <Field key={input.key} label={label} error={errors[input.key]}>
            <TextInput
              fit="medium"
              inputMode={input.type === 'version' ? 'decimal' : undefined}
              value={values[input.key] ?? ''}
              disabled={disabled}
              onChange={(e) => onChange(input.key, e.target.value)}
            />
          </Field>
        );
      })}
    </div>
  );
}

interface YesNoFieldProps {
  label: string;
  value: string;
  error: string | undefined;
  disabled: boolean;
  onChange: (value: 'yes' | 'no') => void;
}

const YES_NO = [
  { value: 'yes', label: 'Yes' },
  { value: 'no', label: 'No' },
] as const;

/** A yes/no question as two large radio chips; nothing is chosen until the technician answers. */
export function YesNoField({ label, value, error, disabled, onChange }: YesNoFieldProps) {
  return <RadioChips legend={label} options={YES_NO} value={value} error={error} disabled={disabled} onChange={onChange} />;
}
