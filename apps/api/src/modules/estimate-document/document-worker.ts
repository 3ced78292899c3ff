// Runs inside a piscina worker thread: lays out and writes one estimate or invoice PDF. pdfkit works
// synchronously (text measuring, font subsetting, compression), so this keeps that work off
// the API's event loop; the pool ends the thread when a document outlives its budget.
import { Piscina } from 'piscina';
import type { DocumentTask } from './document-task.js';
import { renderInvoiceDocument } from './invoice-document.js';
import { renderEstimateDocument } from './render-document.js';
import { renderStatementDocument } from './statement-document.js';

export default async function renderInWorker(task: DocumentTask): Promise<unknown> {
  task.startedPort.postMessage('started');
  task.startedPort.close();
  const { job } = task;
  const bytes =
    job.kind === 'invoice'
      ? await renderInvoiceDocument(job.input)
      : job.kind === 'statement'
        ? await renderStatementDocument(job.input)
        : await renderEstimateDocument(job.input);
  // Moved, not copied, back to the pool's thread.
  return Piscina.move(bytes);
}
