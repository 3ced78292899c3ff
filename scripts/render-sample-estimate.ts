/**
 * render-sample-estimate — writes the estimate document for invented demo input (an invented
 * company and customer, two tiers, two planned areas, cautions and a cancellation notice) to
 * `.tmp/sample-estimate.pdf`, to look at the layout without a database or a server.
 * Usage: `pnpm exec tsx scripts/render-sample-estimate.ts [--no-cancellation] [--no-areas] [out.pdf]`.
 * Safe in production: it reads no database and no settings and writes only the one file.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import {
  closeDefaultDocumentPool,
  renderEstimatePdf,
  sampleEstimateDocumentInput,
} from '@seamwright/api';

const args = process.argv.slice(2);
const out = resolve(args.find((arg) => !arg.startsWith('--')) ?? '.tmp/sample-estimate.pdf');
const input = sampleEstimateDocumentInput({
  cancellation: !args.includes('--no-cancellation'),
  areas: !args.includes('--no-areas'),
});

const started = performance.now();
try {
  const pdf = await renderEstimatePdf(input);
  mkdirSync(dirname(out), { recursive: true });
  writeFileSync(out, pdf);
  const ms = Math.round(performance.now() - started);
  console.log(`wrote ${out} (${pdf.length} bytes, ${ms} ms including the worker's start)`);
} finally {
  await closeDefaultDocumentPool();
}
