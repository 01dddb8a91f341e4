/**
 * Helpers for the lab API tests: diagrams from templates and uploads, waiting for analyses, binary bodies.
 * Test files: diagrams.test.ts (behaviour and published values), diagrams-roles.test.ts (role matrix).
 */
import { buildTemplate, writeObj } from '../../geometry/index.js';
import {
  analysisResponseSchema, diagramResponseSchema, DIAGRAM_PATHS, type AnalysisResponse, type Diagram, type TemplateSpec,
} from '../../server/contract/diagrams.js';
import type { Agent } from './helpers.js';

/** Creates a diagram from a template through the API (201 expected). */
export async function createFromTemplate(agent: Agent, workspaceId: string, template: TemplateSpec, name = `${template.kind} test`): Promise<Diagram> {
  const res = await agent.post(DIAGRAM_PATHS.create(workspaceId)).send({ name, template });
  if (res.status !== 201) throw new Error(`create failed: ${res.status} ${JSON.stringify(res.body)}`);
  return diagramResponseSchema.parse(res.body).diagram;
}

/** Polls the analysis until it is done or failed (at most ~60 s). */
export async function waitForAnalysis(agent: Agent, diagramId: string, revision: number): Promise<AnalysisResponse> {
  for (let i = 0; i < 600; i++) {
    const res = await agent.get(DIAGRAM_PATHS.analysis(diagramId, revision));
    if (res.status !== 200) throw new Error(`analysis: ${res.status} ${JSON.stringify(res.body)}`);
    const a = analysisResponseSchema.parse(res.body);
    if (a.status === 'done' || a.status === 'failed') return a;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('analysis did not finish');
}

/** OBJ text of a template diagram, written by the geometry core's writer (test fixtures come from code). */
export function templateObj(template: TemplateSpec): string {
  const d = buildTemplate(template);
  if (!d.ok) throw new Error(d.errors[0]?.message);
  return writeObj(d.value);
}

/** superagent parser that keeps a binary body as a Buffer. */
export function binaryParser(res: unknown, done: (err: Error | null, body: unknown) => void): void {
  const stream = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}
