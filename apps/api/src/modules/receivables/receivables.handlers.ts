import type { Request, Response } from 'express';
import { agingQuerySchema, exportQuerySchema, sendStatementInputSchema } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import { renderStatementPdf } from '../estimate-document/index.js';
import { companyToday } from '../invoices/invoice-read.js';
import { agingReport, resolveAsOf } from './aging.service.js';
import { invoicesCsv, paymentsCsv } from './exports-csv.js';
import { selectInvoicesForExport, selectPaymentsForExport } from './exports.repository.js';
import { statementFilename, sendStatement } from './statement-send.service.js';
import { buildStatement } from './statement.service.js';

function sendCsv(res: Response, filename: string, csv: string): void {
  res
    .status(200)
    .type('text/csv; charset=utf-8')
    .attachment(filename)
    .set({ 'Cache-Control': 'private, no-store', 'X-Content-Type-Options': 'nosniff' })
    .send(csv);
}

export function createReceivablesHandlers(deps: ServiceDeps) {
  const { sequelize } = deps;
  const customerId = (req: Request) => parseId(req.params.id, 'Customer');
  return {
    aging: async (req: Request, res: Response): Promise<void> => {
      const ctx = contextOf(req);
      const query = parseInput(agingQuerySchema, req.query);
      const asOf = await resolveAsOf(ctx, query.asOf);
      res.json({ data: await agingReport(ctx, sequelize, asOf) });
    },
    statementPdf: async (req: Request, res: Response): Promise<void> => {
      const statement = await buildStatement(contextOf(req), sequelize, customerId(req));
      const pdf = await renderStatementPdf(statement);
      res
        .status(200)
        .set({
          'Content-Type': 'application/pdf',
          'Content-Disposition': `attachment; filename="${statementFilename(statement.customer.name, statement.issuedOn)}"`,
          'X-Content-Type-Options': 'nosniff',
          'Cache-Control': 'private, no-store',
        })
        .send(pdf);
    },
    sendStatement: async (req: Request, res: Response): Promise<void> => {
      const id = customerId(req);
      const input = parseInput(sendStatementInputSchema, req.body ?? {});
      res.json({ data: await sendStatement(deps, contextOf(req), id, input) });
    },
    invoicesCsv: async (req: Request, res: Response): Promise<void> => {
      const ctx = contextOf(req);
      const range = parseInput(exportQuerySchema, req.query);
      const [rows, today] = await Promise.all([
        selectInvoicesForExport(ctx, sequelize, range),
        companyToday(ctx),
      ]);
      sendCsv(res, 'invoices.csv', invoicesCsv(rows, today));
    },
    paymentsCsv: async (req: Request, res: Response): Promise<void> => {
      const range = parseInput(exportQuerySchema, req.query);
      const rows = await selectPaymentsForExport(contextOf(req), sequelize, range);
      sendCsv(res, 'payments.csv', paymentsCsv(rows));
    },
  };
}
