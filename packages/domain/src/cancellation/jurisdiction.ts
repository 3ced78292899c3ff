// Which jurisdictions' cancellation rules apply to a company, from its region code (Settings →
// "State or region code": `CO`, `CA`, `ON`; `US-CA` is read the same as `CA`).

/** US states, DC and the territories the FTC rule reaches, as two-letter postal codes. */
const usRegions = new Set(
  (
    'AL AK AZ AR CA CO CT DE FL GA HI ID IL IN IA KS KY LA ME MD MA MI MN MS MO MT NE NV NH NJ ' +
    'NM NY NC ND OH OK OR PA RI SC SD TN TX UT VT VA WA WV WI WY DC PR GU VI AS MP'
  ).split(' '),
);

/**
 * The jurisdiction tags whose rules apply, broadest first: a US region gives `US` and `US-XX`.
 * A company that has not set a region is taken to be in the US (Seamwright serves US installers
 * first, and showing a buyer a right they may not have is the safe side of the mistake). A
 * region outside the US has no rules on file yet, so its sales are not covered.
 */
export function jurisdictionsOf(region: string | null | undefined): string[] {
  const code = (region ?? '').trim().toUpperCase().replace(/^US-/, '');
  if (code === '' || code === 'US') return ['US'];
  if (usRegions.has(code)) return ['US', `US-${code}`];
  return [];
}
