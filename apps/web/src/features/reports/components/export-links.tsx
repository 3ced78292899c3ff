import { buttonClasses } from '../../../components/ui/button';

/** The accountant's files for the chosen period: plain links, the browser saves them. */
export function ExportLinks({ query }: { query: string }) {
  return (
    <div className="flex flex-wrap gap-2 print:hidden">
      <a className={buttonClasses('secondary')} href={`/api/exports/invoices.csv${query}`} download>
        Invoices (CSV)
      </a>
      <a className={buttonClasses('secondary')} href={`/api/exports/payments.csv${query}`} download>
        Payments (CSV)
      </a>
    </div>
  );
}
