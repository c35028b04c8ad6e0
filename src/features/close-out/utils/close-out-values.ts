import type { DefaultValues } from 'react-hook-form';
import type { z } from 'zod';
import type { closeOutSchema } from '@shared/schemas/visit';
import type { VisitDetail } from '@shared/schemas/visit-detail';
import { formatMinutes } from '@shared/format/minutes';

/** What the form holds while it is typed: text for numbers, unticked boxes, an empty signature. */
export type CloseOutFields = z.input<typeof closeOutSchema>;
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
 * from the customer. A visit reopened after a return starts from its stored close-out (parts with
 * their ids, so the corrected close replaces them); only the signature is asked for again.
 */
export function closeOutDefaults(visit: VisitDetail, contact: CustomerContact | undefined): DefaultValues<CloseOutFields> {
  const stored = visit.closeOut;
  if (stored.actionsTaken !== null) {
    const rts = stored.returnToService;
    return {
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
      returnToService: rts ? { ...rts, stoppingTimeMs: rts.stoppingTimeMs === undefined ? undefined : String(rts.stoppingTimeMs) } : { stoppingTimeMs: undefined },
      contactName: stored.contactName ?? contact?.contactName ?? '',
      contactEmail: stored.contactEmail ?? contact?.contactEmail ?? '',
      signaturePng: '',
    };
  }
  return {
    causeCategory: visit.likelyCauses.ranked[0]?.cause,
    actionsTaken: '',
    recommendations: undefined,
    parts: [],
    labourMinutes: '',
    travelMinutes: '',
    controlFirmwareLeft: visit.controlFirmwareFound ?? '',
    monitorFirmwareLeft: visit.monitorFirmwareFound ?? '',
    returnToService: { stoppingTimeMs: undefined },
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
