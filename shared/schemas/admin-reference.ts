import { z } from 'zod';
import { bandSetValuesSchema, generationKeySchema, type BandSetValues } from './band-set';
import { firmwareRuleSchema, type FirmwareRule } from './firmware-rule';
import { nameText } from './text';
import type { CauseCategory } from './reading';
import type { ProcedureDefinition, StepKind } from './procedure';

/** Shared by the three kinds of versioned reference data. */
export interface VersionInfo {
  id: number;
  version: number;
  publishedAt: string | null;
  createdAt: string;
}

export const generationParamSchema = z.object({ generation: generationKeySchema });

export const bandSetDraftSchema = z.object({ bands: bandSetValuesSchema });
export type BandSetDraftInput = z.infer<typeof bandSetDraftSchema>;

export interface BandSetVersionRecord extends VersionInfo {
  generation: string;
  label: string;
  bands: BandSetValues;
}

export interface BandSetGeneration {
  generation: string;
  /** The newest published version: what new visits pin. */
  current: BandSetVersionRecord | null;
  draft: BandSetVersionRecord | null;
  versions: (VersionInfo & { label: string })[];
}

export const firmwareRulesDraftSchema = z.object({
  rules: z
    .array(firmwareRuleSchema)
    .max(200)
    .superRefine((rules, ctx) => {
      const seen = new Set<string>();
      rules.forEach((rule, i) => {
        if (seen.has(rule.key)) ctx.addIssue({ code: 'custom', message: `Another rule already uses the key "${rule.key}"; give each rule its own key`, path: [i, 'key'] });
        seen.add(rule.key);
      });
    }),
});
export type FirmwareRulesDraftInput = z.infer<typeof firmwareRulesDraftSchema>;

export interface FirmwareRuleSetRecord extends VersionInfo {
  rules: FirmwareRule[];
}

export interface FirmwareRuleSets {
  current: FirmwareRuleSetRecord | null;
  draft: FirmwareRuleSetRecord | null;
  versions: (VersionInfo & { ruleCount: number })[];
}

/** An import: the envelope is checked here, the definition by the procedure validator. */
export const procedureImportSchema = z.object({
  key: z.string().regex(/^[a-z0-9][a-z0-9-]{0,62}$/, 'use lower-case letters, digits and hyphens, like crank-angle-check'),
  title: nameText({ min: 1, minMessage: 'Give the procedure a title', max: 160 }),
  definition: z.unknown(),
});
export type ProcedureImportInput = z.infer<typeof procedureImportSchema>;

export interface ProcedureProblemRecord {
  stepId: string | null;
  message: string;
}

export interface DiagramNode {
  id: string;
  kind: StepKind;
  title: string;
  /** Distance from the start step in steps (breadth-first); unreachable steps sit in a last layer. */
  layer: number;
  /** Position within its layer, left to right. */
  index: number;
  reachable: boolean;
  cause?: CauseCategory;
}

export interface DiagramEdge {
  from: string;
  to: string;
  /** The outcome that takes this branch, as the technician sees it. */
  label: string;
  /** The target is not a step of this procedure. */
  missingTarget: boolean;
}

export interface ProcedureDiagram {
  start: string;
  layers: number;
  nodes: DiagramNode[];
  edges: DiagramEdge[];
}

export interface ProcedureCheck {
  ok: boolean;
  problems: ProcedureProblemRecord[];
  /** Null when the JSON is not shaped like a procedure at all. */
  diagram: ProcedureDiagram | null;
}

export interface ProcedureVersionRecord extends VersionInfo {
  key: string;
  title: string;
  definition: ProcedureDefinition;
  diagram: ProcedureDiagram;
}

export interface ProcedureSummary {
  key: string;
  title: string;
  current: (VersionInfo & { title: string }) | null;
  draft: (VersionInfo & { title: string }) | null;
  versions: (VersionInfo & { title: string })[];
}
