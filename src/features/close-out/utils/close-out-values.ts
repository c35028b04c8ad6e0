import type { DefaultValues } from 'react-hook-form';
import type { z } from 'zod';
import type { AsLeftState, closeOutSchema } from '@shared/schemas/visit';
import type { FindingStep } from '@shared/schemas/procedure';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { formatMinutes } from '@shared/format/minutes';

type FormInput = z.input<typeof closeOutSchema>;
type ReturnedInput = Extract<FormInput, { asLeft: 'returned_to_production' }>;
type LockedOutInput = Extract<FormInput, { asLeft: 'locked_out' }>;

/**
 * What the form holds while it is typed: text for numbers, unticked boxes, an empty signature. Both
 * as-left branches are held at once (the technician may switch back and forth); the schema keeps only
 * the chosen one's fields.
 */
export type CloseOutFields = Omit<ReturnedInput, 'asLeft' | 'returnToService'> & {
  asLeft: AsLeftState;
  returnToService?: Partial<ReturnedInput['returnToService']>;
  lockedOut?: Partial<LockedOutInput['lockedOut']>;
};
export type PartRowFields = NonNullable<CloseOutFields['parts']>[number];

export interface CustomerContact {
  contactName: string | null;
  contactEmail: string | null;
}

/** A new parts row; its id is made once here, so a retried close-out stores the part only once. */
export const newPartRow = (): PartRowFields => ({
  id: crypto.randomUUID(),
  partNumber: '',
  description: '',
  quantity: '1',
  serialRemoved: undefined,
  serialFitted: undefined,
});

/**
 * The engine's best-ranked cause is preselected; firmware as left starts as found; the contact comes
 * from the customer. A finding that escalates (the press cannot be repaired on this visit) starts as
 * "left locked out", waiting for a board when the finding is the board's. A visit reopened after a
 * return starts from its stored close-out (parts with their ids, so the corrected close replaces
 * them; the as-left state and its checks as stored); only the signature is asked for again.
 */
export function closeOutDefaults(visit: VisitDetail, contact: CustomerContact | undefined, finding?: FindingStep): DefaultValues<CloseOutFields> {
  const stored = visit.closeOut;
  if (stored.actionsTaken !== null) {
    const rts = stored.returnToService;
    const asText = (n: number | undefined) => (n === undefined ? undefined : String(n));
    return {
      asLeft: stored.asLeftState ?? 'returned_to_production',
      lockedOut: stored.lockedOut ?? {},
      causeCategory: stored.causeCategory ?? visit.likelyCauses.ranked[0]?.cause,
      actionsTaken: stored.actionsTaken,
      recommendations: stored.recommendations ?? undefined,
      parts: stored.parts.map((p) => ({
        id: p.id,
        partNumber: p.partNumber,
        description: p.description,
        quantity: String(p.quantity),
        serialRemoved: p.serialRemoved ?? undefined,
        serialFitted: p.serialFitted ?? undefined,
      })),
      labourMinutes: stored.labourMinutes === null ? '' : String(stored.labourMinutes),
      travelMinutes: stored.travelMinutes === null ? '' : String(stored.travelMinutes),
      controlFirmwareLeft: visit.controlFirmwareLeft ?? visit.controlFirmwareFound ?? '',
      monitorFirmwareLeft: visit.monitorFirmwareLeft ?? visit.monitorFirmwareFound ?? '',
      returnToService: rts
        ? { ...rts, stoppingTimeMs: asText(rts.stoppingTimeMs), strokesPerMinute: asText(rts.strokesPerMinute), engagingPoints: asText(rts.engagingPoints) }
        : { stoppingTimeMs: undefined, strokesPerMinute: undefined, engagingPoints: undefined },
      contactName: stored.contactName ?? contact?.contactName ?? '',
      contactEmail: stored.contactEmail ?? contact?.contactEmail ?? '',
      signaturePng: '',
    };
  }
  const escalates = finding?.escalate === true;
  return {
    asLeft: escalates ? 'locked_out' : 'returned_to_production',
    lockedOut: escalates && visit.likelyCauses.ranked[0]?.cause === 'board' ? { waitsFor: 'board' } : {},
    causeCategory: visit.likelyCauses.ranked[0]?.cause,
    actionsTaken: '',
    recommendations: undefined,
    parts: [],
    labourMinutes: '',
    travelMinutes: '',
    controlFirmwareLeft: visit.controlFirmwareFound ?? '',
    monitorFirmwareLeft: visit.monitorFirmwareFound ?? '',
    returnToService: { stoppingTimeMs: undefined, strokesPerMinute: undefined, engagingPoints: undefined },
    contactName: contact?.contactName ?? '',
    contactEmail: contact?.contactEmail ?? '',
    signaturePng: '',
  };
}

/** Empty optional text goes to the server as absent, not as an empty string it would store. */
export const emptyAsAbsent = (value: unknown) => (typeof value === 'string' && value.trim() === '' ? undefined : value);

/** "95" → "1:35"; null while the minutes are not a whole number yet. */
export function hoursAndMinutes(text: unknown): string | null {
  if (typeof text !== 'string' || !/^\s*\d+\s*$/.test(text)) return null;
  return formatMinutes(Number(text));
}
