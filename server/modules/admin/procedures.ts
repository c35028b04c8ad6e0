import type { Router } from 'express';
import { procedureImportSchema, type ProcedureCheck, type ProcedureSummary, type ProcedureVersionRecord } from '../../../shared/schemas/admin-reference';
import { procedureDefinitionSchema } from '../../../shared/schemas/procedure';
import { validateProcedure } from '../../../shared/domain/validate-procedure';
import { AppError } from '../../lib/errors';
import { valid, validate } from '../../lib/validate';
import { ProcedureVersion } from '../reference/reference.model';
import { versionInfo, type VersionedResource } from '../../lib/versioned-records/versioned-service';
import { procedureDiagram } from './procedure-diagram';
import { versionedRoutes } from '../../lib/versioned-records/versioned-routes';

/** Runs the validator; the diagram is drawn whenever the JSON has the shape of a procedure, so a broken branch can be seen. */
export function checkProcedure(definition: unknown): ProcedureCheck {
  const result = validateProcedure(definition);
  const shaped = procedureDefinitionSchema.safeParse(definition);
  return { ok: result.ok, problems: result.ok ? [] : result.problems, diagram: shaped.success ? procedureDiagram(shaped.data) : null };
}

/** The answer to a procedure that fails the validator: nothing is saved and every problem is listed. */
function rejection(check: ProcedureCheck) {
  const n = check.problems.length;
  const message = `Nothing was saved: the procedure has ${n} problem${n === 1 ? '' : 's'}. Fix ${n === 1 ? 'it' : 'them'} in the JSON and import again.`;
  return { error: { code: 'procedure_invalid', message }, ...check };
}

const summary = (p: ProcedureVersion) => ({ ...versionInfo(p), title: p.title });

/** Procedures: one family per key; a draft is imported as JSON, checked by the validator, and replaces an earlier draft. */
export const procedures: VersionedResource<ProcedureVersion, ProcedureVersionRecord, ProcedureSummary, typeof procedureImportSchema> = {
  model: ProcedureVersion,
  what: 'The procedure',
  audit: 'procedure',
  family: { column: 'key' },
  toRecord: (p) => ({ ...versionInfo(p), key: p.key, title: p.title, definition: p.definition, diagram: procedureDiagram(p.definition) }),
  list: {
    exclude: ['definition'],
    item: ({ family, rows, current, draft }) => ({
      key: family!,
      title: (current ?? rows[0]!).title,
      current: current ? summary(current) : null,
      draft: draft ? summary(draft) : null,
      versions: rows.map(summary),
    }),
  },
  draft: {
    schema: procedureImportSchema,
    familyOf: (input) => input.key,
    verb: 'imported',
    accept: ({ title, definition }) => {
      const result = validateProcedure(definition);
      return result.ok ? { content: { title, definition: result.definition } } : { rejected: rejection(checkProcedure(definition)) };
    },
  },
  // Stored drafts passed the validator on import; check again so a rule added since then still holds.
  beforePublish: (row) => {
    const check = checkProcedure(row.definition);
    if (!check.ok) throw new AppError(409, 'procedure_invalid', `This draft no longer passes the validator: ${check.problems.map((p) => p.message).join(' ')}`);
  },
};

/** POST /check runs the validator and draws the diagram without saving anything. */
export function procedureRoutes(): Router {
  return versionedRoutes(procedures, (router) => {
    const definitionOnly = procedureImportSchema.pick({ definition: true });
    router.post('/check', validate('body', definitionOnly), (req, res) => {
      res.json(checkProcedure(valid(req, 'body', definitionOnly).definition));
    });
  });
}
