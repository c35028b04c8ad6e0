import { formatSi } from '@shared/domain/format-quantity';
import type { ResolverOutput } from '@shared/domain/resolver-output';

/** What the two stator voltages say together: their vector magnitude, the ratio to excitation and the angle. */
export function ResolverPanel({ output }: { output: ResolverOutput | null }) {
  return (
    <section aria-labelledby="resolver-heading" className="rounded-lg border border-surface-line bg-surface-raised p-4">
      <h3 id="resolver-heading" className="text-xl font-semibold text-ink">
        Resolver output analysis
      </h3>
      {output ? (
        <dl className="mt-3 grid gap-3 text-lg sm:grid-cols-3">
          <div>
            <dt className="text-base text-ink-muted">Vector magnitude √(V(S1–S3)² + V(S2–S4)²)</dt>
            <dd className="font-semibold text-ink">{formatSi(output.magnitude, 'ac_voltage')}</dd>
          </div>
          <div>
            <dt className="text-base text-ink-muted">Transformation ratio k</dt>
            <dd className="font-semibold text-ink">{output.transformationRatio === null ? 'needs the excitation reading' : output.transformationRatio.toFixed(3)}</dd>
          </div>
          <div>
            <dt className="text-base text-ink-muted">Electrical angle (first quadrant)</dt>
            <dd className="font-semibold text-ink">{output.firstQuadrantAngle.toFixed(1)}°</dd>
          </div>
        </dl>
      ) : (
        <p className="mt-2 text-lg text-ink-muted">Enter both stator voltages to see their magnitude, ratio and angle.</p>
      )}
      <p className="mt-2 text-base text-ink-muted">
        The magnitude stays the same at every crank angle, so it is what is judged. An AC meter reads RMS without phase, so the angle is folded into 0–90°.
      </p>
    </section>
  );
}
