import { SelectField } from '../../../components/ui/form-fields';
import { SearchBox } from '../../../components/ui/search-box';
import { useRollProducts } from '../api/get-roll-products';
import type { StockListParams } from '../utils/list-params';

interface StockFiltersProps {
  params: StockListParams;
  onChange: (change: Partial<StockListParams>) => void;
}

const kindOptions = [
  { value: 'all', label: 'All' },
  { value: 'roll', label: 'Rolls' },
  { value: 'remnant', label: 'Remnants' },
] as const;

/** Product, kind, dye lot and whether used-up and archived rolls show. */
export function StockFilters({ params, onChange }: StockFiltersProps) {
  const products = useRollProducts();
  const choices = products.data ?? [];
  // A product from the URL that has no rolls left to read it from still shows as chosen.
  const missing = params.product !== '' && !choices.some((p) => p.id === params.product);
  return (
    <div className="mb-4 flex flex-wrap items-end gap-4 print:hidden">
      <SelectField
        label="Product"
        value={params.product}
        onChange={(event) => onChange({ product: event.target.value })}
        wrapperClassName="w-full sm:w-64"
      >
        <option value="">Every product</option>
        {choices.map((product) => (
          <option key={product.id} value={product.id}>
            {product.name}
          </option>
        ))}
        {missing ? <option value={params.product}>The chosen product</option> : null}
      </SelectField>
      <SearchBox
        label="Dye lot"
        value={params.dyeLot}
        onSearch={(dyeLot) => onChange({ dyeLot })}
        placeholder="The lot as printed on the label"
      />
      <div className="flex flex-wrap items-end gap-4">
        <SelectField
          label="Kind"
          value={params.kind}
          onChange={(event) =>
            onChange({
              kind: kindOptions.find((o) => o.value === event.target.value)?.value ?? 'all',
            })
          }
          wrapperClassName="w-28"
        >
          {kindOptions.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </SelectField>
        <label className="flex min-h-11 items-center gap-2">
          <input
            type="checkbox"
            className="h-5 w-5 accent-moss-700"
            checked={params.all}
            onChange={(event) => onChange({ all: event.target.checked })}
          />
          Used-up and archived too
        </label>
      </div>
    </div>
  );
}
