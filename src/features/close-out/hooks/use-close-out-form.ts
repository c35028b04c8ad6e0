import { useFormContext } from 'react-hook-form';
import type { CloseOutFields } from '../utils/close-out-values';

/** The close-out form as each section needs it (sections sit inside the form's FormProvider). */
export function useCloseOutForm() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<CloseOutFields>();
  return { register, control, errors };
}
