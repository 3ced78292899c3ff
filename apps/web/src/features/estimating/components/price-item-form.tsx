import { z } from 'zod';
import type { PriceBookItemView } from '@seamwright/shared';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import { parsePrice, priceInputValue } from '../utils/money';

const priceItemFormSchema = z.object({
  name: z.string().trim().min(1, 'Name is required').max(120),
  unit: z.string().trim().min(1, 'Unit is required').max(20),
  price: z
    .string()
    .trim()
    .refine((text) => parsePrice(text) !== null, 'Enter a price like 2.35 (up to 5 decimals)'),
});
export type PriceItemFormValues = z.output<typeof priceItemFormSchema>;

/** Name, unit and price of an item; the other attributes keep their values. */
export function PriceItemForm({
  item,
  onSubmit,
}: {
  item: PriceBookItemView;
  onSubmit: (values: { name: string; unit: string; priceMillicents: number }) => Promise<unknown>;
}) {
  return (
    <Form
      schema={priceItemFormSchema}
      defaultValues={{
        name: item.name,
        unit: item.unit,
        price: priceInputValue(item.priceMillicents),
      }}
      onSubmit={(values) =>
        onSubmit({
          name: values.name,
          unit: values.unit,
          priceMillicents: parsePrice(values.price) ?? 0,
        })
      }
    >
      <TextField name="name" label="Name" />
      <TextField name="unit" label="Unit" />
      <TextField name="price" label={`Price per ${item.unit}`} inputMode="decimal" />
      <SubmitButton>Save item</SubmitButton>
    </Form>
  );
}

const newItemFormSchema = priceItemFormSchema.extend({
  kind: z.enum(['material', 'equipment', 'disposal']),
  key: z
    .string()
    .trim()
    .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'Use letters, digits, dots, dashes and underscores')
    .max(60),
});

/** A new material, rental or disposal item (turf and labour carry more details; import them). */
export function NewItemForm({
  onSubmit,
}: {
  onSubmit: (values: {
    kind: 'material' | 'equipment' | 'disposal';
    key: string;
    name: string;
    unit: string;
    priceMillicents: number;
  }) => Promise<unknown>;
}) {
  return (
    <Form
      schema={newItemFormSchema}
      defaultValues={{ kind: 'material', key: '', name: '', unit: '', price: '' }}
      onSubmit={(values) => onSubmit({ ...values, priceMillicents: parsePrice(values.price) ?? 0 })}
    >
      <SelectField name="kind" label="Kind">
        <option value="material">Material</option>
        <option value="equipment">Equipment rental</option>
        <option value="disposal">Disposal</option>
      </SelectField>
      <TextField name="key" label="Key (SKU)" />
      <TextField name="name" label="Name" />
      <TextField name="unit" label="Unit" />
      <TextField name="price" label="Price per unit" inputMode="decimal" />
      <SubmitButton>Add item</SubmitButton>
    </Form>
  );
}
