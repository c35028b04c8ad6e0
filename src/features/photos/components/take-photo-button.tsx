import { useRef } from 'react';
import { Button } from '@/components/ui/button';

interface TakePhotoButtonProps {
  onFiles: (files: File[]) => void;
  disabled?: boolean;
  describedBy?: string;
}

/**
 * A big button that opens the tablet's rear camera (or the file picker on a desktop). The file
 * input itself stays out of sight and out of the tab order: the button is the one control.
 */
export function TakePhotoButton({ onFiles, disabled, describedBy }: TakePhotoButtonProps) {
  const inputRef = useRef<HTMLInputElement>(null);
  return (
    <>
      <Button size="lg" className="min-h-16 px-8" disabled={disabled} aria-describedby={describedBy} onClick={() => inputRef.current?.click()}>
        <svg aria-hidden="true" viewBox="0 0 24 24" className="h-7 w-7 fill-none stroke-current stroke-2">
          <path d="M3 8h4l2-3h6l2 3h4v11H3Z" />
          <circle cx="12" cy="13" r="3.5" />
        </svg>
        Take photo
      </Button>
      <input
        ref={inputRef}
        type="file"
        accept="image/*"
        capture="environment"
        multiple
        disabled={disabled}
        tabIndex={-1}
        aria-hidden="true"
        aria-label="Take photo"
        className="sr-only"
        onChange={(event) => {
          const files = Array.from(event.target.files ?? []);
          // Cleared so the same picture can be chosen again after a refused upload.
          event.target.value = '';
          if (files.length) onFiles(files);
        }}
      />
    </>
  );
}
