import { useCallback, useEffect, useId, useRef, type Ref } from 'react';
import { Button } from '@/components/ui/button';
import { FieldError } from '@/components/ui/field-error';

interface SignaturePadProps {
  label: string;
  /** The signature as a PNG data URL; '' while unsigned. */
  value: string;
  onChange: (png: string) => void;
  onBlur?: () => void;
  error?: string;
  /** Focused by the form when the signature is missing. */
  ref?: Ref<HTMLCanvasElement>;
}

const INK = '#15191E';
const PAPER = '#FFFFFF';
// Used when layout reports no size (before paint, or in tests).
const FALLBACK = { width: 600, height: 220 };

function paintPaper(canvas: HTMLCanvasElement) {
  const ctx = canvas.getContext('2d');
  if (!ctx) return null;
  // White, not transparent: the PNG goes into an e-mail and a PDF on any background.
  ctx.fillStyle = PAPER;
  ctx.fillRect(0, 0, canvas.width, canvas.height);
  return ctx;
}

/** A box the customer signs with finger, stylus or mouse; every finished stroke updates the PNG. */
export function SignaturePad({ label, value, onChange, onBlur, error, ref }: SignaturePadProps) {
  const id = useId();
  const canvasRef = useRef<HTMLCanvasElement | null>(null);
  const drawing = useRef<{ x: number; y: number } | null>(null);
  const inked = useRef(false);
  const initialValue = useRef(value);

  const setCanvas = useCallback(
    (canvas: HTMLCanvasElement | null) => {
      canvasRef.current = canvas;
      if (typeof ref === 'function') ref(canvas);
      else if (ref) ref.current = canvas;
    },
    [ref],
  );

  // Size the bitmap to the box in device pixels, so strokes stay sharp on high-density tablet screens.
  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const box = canvas.getBoundingClientRect();
    const ratio = window.devicePixelRatio || 1;
    canvas.width = Math.round((box.width || FALLBACK.width) * ratio);
    canvas.height = Math.round((box.height || FALLBACK.height) * ratio);
    const ctx = paintPaper(canvas);
    if (!ctx) return;
    ctx.lineWidth = 2.5 * ratio;
    ctx.lineCap = 'round';
    ctx.lineJoin = 'round';
    ctx.strokeStyle = INK;
    // Coming back to a form that was already signed: show that signature again.
    if (initialValue.current) {
      const image = new Image();
      image.onload = () => ctx.drawImage(image, 0, 0, canvas.width, canvas.height);
      image.src = initialValue.current;
      inked.current = true;
    }
  }, []);

  const toCanvasPoint = (event: React.PointerEvent<HTMLCanvasElement>) => {
    const canvas = event.currentTarget;
    const box = canvas.getBoundingClientRect();
    // The box may be stretched by CSS (e.g. after rotating the tablet); map screen points onto the bitmap.
    const scaleX = box.width ? canvas.width / box.width : 1;
    const scaleY = box.height ? canvas.height / box.height : 1;
    return { x: (event.clientX - box.left) * scaleX, y: (event.clientY - box.top) * scaleY };
  };

  const onPointerDown = (event: React.PointerEvent<HTMLCanvasElement>) => {
    if (event.pointerType === 'mouse' && event.button !== 0) return;
    event.preventDefault();
    event.currentTarget.setPointerCapture?.(event.pointerId);
    drawing.current = toCanvasPoint(event);
  };

  const onPointerMove = (event: React.PointerEvent<HTMLCanvasElement>) => {
    const from = drawing.current;
    const ctx = event.currentTarget.getContext('2d');
    if (!from || !ctx) return;
    const to = toCanvasPoint(event);
    ctx.beginPath();
    ctx.moveTo(from.x, from.y);
    ctx.lineTo(to.x, to.y);
    ctx.stroke();
    drawing.current = to;
    inked.current = true;
  };

  const endStroke = (event: React.PointerEvent<HTMLCanvasElement>) => {
    if (!drawing.current) return;
    drawing.current = null;
    // A tap without movement leaves no line, so it does not count as signing.
    if (inked.current) onChange(event.currentTarget.toDataURL('image/png'));
    onBlur?.();
  };

  const clear = () => {
    const canvas = canvasRef.current;
    if (canvas) paintPaper(canvas);
    inked.current = false;
    initialValue.current = '';
    onChange('');
  };

  const signed = value !== '';
  const describedBy = [`${id}-how`, `${id}-state`, error ? `${id}-error` : undefined].filter(Boolean).join(' ');

  return (
    <div className="space-y-2">
      <p id={`${id}-label`} className="text-lg font-semibold text-ink">
        {label}
      </p>
      <p id={`${id}-how`} className="text-base text-ink-muted">
        Sign above the line with a finger or stylus. The signature must be drawn: it cannot be typed with the keyboard.
      </p>
      <div className="relative">
        <canvas
          ref={setCanvas}
          tabIndex={-1}
          aria-labelledby={`${id}-label`}
          aria-describedby={describedBy}
          aria-invalid={error ? true : undefined}
          className="block h-56 w-full cursor-crosshair touch-none rounded-lg border-2 border-surface-edge bg-white focus:outline-none focus-visible:ring-[3px] focus-visible:ring-accent aria-[invalid=true]:border-verdict-out_of_band"
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={endStroke}
          onPointerCancel={endStroke}
        />
        {/* The signing line is drawn over the canvas, not into it, so it stays out of the PNG. */}
        <div aria-hidden="true" className="pointer-events-none absolute inset-x-6 bottom-12 flex items-end gap-2 border-b-2 border-ink-muted pb-1 text-xl font-bold text-ink-muted">
          ✕
        </div>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p id={`${id}-state`} role="status" className="text-lg font-semibold text-ink">
          {signed ? (
            <>
              <span aria-hidden="true" className="text-verdict-in_band">
                ✓{' '}
              </span>
              Signed
            </>
          ) : (
            'Not signed yet'
          )}
        </p>
        <Button variant="secondary" onClick={clear} disabled={!signed}>
          Clear signature
        </Button>
      </div>
      <FieldError id={`${id}-error`} message={error} />
    </div>
  );
}
