/** `base.looseToCompactedFactor` → section "base", label "Loose to compacted factor". */
export function settingLabel(path: string): { section: string; label: string } {
  const parts = path.split('.');
  const leaf = parts.slice(1).join(' ');
  const words = leaf
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()
    // Trailing units (`… lb per cu yd`, `… in`) go in brackets: "Spoil loose density (lb per cu yd)".
    .replace(/ (sq ft|cu yd|sq yd|in|ft|lb|oz|gal|tons|lf)( per [a-z ]+)?$/, ' ($1$2)')
    .replace(/ percent$/, ' (%)');
  return { section: parts[0] ?? path, label: words.charAt(0).toUpperCase() + words.slice(1) };
}

/** A setting's value in words for the "standard" column. */
export function settingText(value: unknown): string {
  if (Array.isArray(value)) return value.map((item: unknown) => labelOf(item)).join(', ');
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  return String(value);
}

function labelOf(item: unknown): string {
  if (typeof item === 'object' && item !== null && 'label' in item) return String(item.label);
  return String(item);
}

/** `perimeterNails` → "Perimeter nails". */
export function sectionTitle(section: string): string {
  const words = section.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}
