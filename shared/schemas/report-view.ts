import type { CauseCategory, Verdict } from './reading';
import type { VisitStatus } from './visit';

// What the customer's report page, the PDF and the e-mail all show: one shape, built once per
// request by the server and read as it is by the client.

export interface ReportSafetyStatement {
  signalWord: 'DANGER' | 'WARNING' | 'CAUTION';
  text: string;
  /** Where it applied, e.g. the step titles. */
  appliedAt: string[];
}

export interface ReportReading {
  id: string;
  stepTitle: string;
  /** e.g. "Rotor R1–R2". */
  circuit: string;
  quantity: 'resistance' | 'ac_voltage';
  /** "Control end" or "Sensor end". */
  position: string;
  entered: string;
  /** The reference band, e.g. "100 Ω ± 8 % at 20 °C (near edge ± 15 %)". */
  band: string | null;
  verdict: Verdict | null;
  verdictLabel: string;
  reason: string;
  /** Temperature correction applied, when a winding temperature was given. */
  temperature: string | null;
  /** Cable allowance subtracted, when the cable was described. */
  cable: string | null;
}

export interface ReportPathStep {
  stepId: string;
  title: string;
  kind: string;
  answer: string;
  /** Safety gates: what the technician confirmed, and when. */
  confirmations: string[];
  confirmedAt: string | null;
  details: string[];
  note: string | null;
}

export interface ReportView {
  companyName: string;
  reference: string;
  status: VisitStatus;
  issue: { number: number; corrected: boolean; issuedAt: string; expiresAt: string } | null;
  acknowledgement: { at: string; by: string | null } | null;
  customer: { name: string };
  site: { name: string; address: string | null; city: string | null };
  press: { assetTag: string; model: string; tonnage: number; controlModel: string | null; sensorGeneration: string | null };
  technician: string;
  startedAt: string | null;
  closedAt: string | null;
  faultDisplayed: string;
  procedure: { title: string; version: number };
  bandSet: { label: string; version: number; referenceTemperatureC: number; invented: boolean } | null;
  path: ReportPathStep[];
  finding: { title: string; conclusion: string; recommendedAction: string; escalate: boolean } | null;
  readings: ReportReading[];
  /** Readings typed again during the visit; the earlier values stay in the visit's record. */
  replacedReadings: number;
  firmware: { controlFound: string | null; controlLeft: string | null; monitorFound: string | null; monitorLeft: string | null };
  photos: { id: string; caption: string | null; stepTitle: string | null }[];
  cause: { category: CauseCategory | null; label: string };
  actionsTaken: string | null;
  recommendations: string | null;
  parts: { partNumber: string; description: string; quantity: number; serialRemoved: string | null; serialFitted: string | null }[];
  labourMinutes: number | null;
  travelMinutes: number | null;
  returnToService: { checks: string[]; stoppingTimeMs: number | null } | null;
  safety: ReportSafetyStatement[];
  signature: { contactName: string | null; signedAt: string | null; attachmentId: string | null };
}

export type ReportAcknowledgement = NonNullable<ReportView['acknowledgement']>;
