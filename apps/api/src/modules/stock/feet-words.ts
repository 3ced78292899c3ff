// Lengths in messages: "30 ft", "12.5 ft". The screens show feet and inches (or metres) through
// the web client's units; an API message names the figure the request was made in.
export function formatFeet(ft: number): string {
  const rounded = Math.round(ft * 100) / 100;
  return `${rounded.toLocaleString('en-US')} ft`;
}
