// `POST /v1/checkout/sessions`: the parameters Seamwright sends, checked as the processor
// checks them (mode, success_url, line items with price_data, one currency, a minimum total).
import { invalid } from './errors.js';
import {
  isRecord,
  listOf,
  metadataOf,
  optionalInteger,
  optionalString,
  requiredString,
} from './params.js';
import type { Params } from './params.js';
import type { NewSession } from './store.js';

/** The hosted service's smallest charge in US dollars is 50 cents. */
const minimumCents: Record<string, number> = { usd: 50 };

interface Line {
  amount: number;
  currency: string;
  name: string;
}

function lineOf(raw: unknown, index: number): Line {
  const at = `line_items[${index}]`;
  if (!isRecord(raw)) throw invalid(`Invalid object: ${at}`, at);
  if (raw.price !== undefined)
    throw invalid('The local fake knows no saved prices; send price_data.', `${at}[price]`);
  const priceData = raw.price_data;
  if (!isRecord(priceData))
    throw invalid(
      `Missing required param: ${at}[price_data].`,
      `${at}[price_data]`,
      'parameter_missing',
    );
  const currency = requiredString(
    priceData,
    'currency',
    `${at}[price_data][currency]`,
  ).toLowerCase();
  const unitAmount = optionalInteger(priceData, 'unit_amount', `${at}[price_data][unit_amount]`);
  if (unitAmount === null || unitAmount < 0)
    throw invalid(
      `Missing or negative ${at}[price_data][unit_amount].`,
      `${at}[price_data][unit_amount]`,
    );
  const product = priceData.product_data;
  if (!isRecord(product))
    throw invalid(
      `Missing required param: ${at}[price_data][product_data].`,
      `${at}[price_data][product_data]`,
      'parameter_missing',
    );
  const name = requiredString(product, 'name', `${at}[price_data][product_data][name]`);
  const quantity = optionalInteger(raw, 'quantity', `${at}[quantity]`) ?? 1;
  if (quantity < 1) throw invalid('Quantity must be at least 1.', `${at}[quantity]`);
  return { amount: unitAmount * quantity, currency, name };
}

export function readNewSession(params: Params): NewSession {
  const mode = requiredString(params, 'mode');
  if (mode !== 'payment')
    throw invalid('The local fake supports mode=payment only.', 'mode', 'parameter_unknown');
  const successUrl = requiredString(params, 'success_url');
  const cancelUrl = optionalString(params, 'cancel_url');
  for (const [key, url] of [
    ['success_url', successUrl],
    ['cancel_url', cancelUrl],
  ] as const) {
    if (url !== null && !/^https?:\/\//.test(url))
      throw invalid(`Not a valid URL: ${key}`, key, 'url_invalid');
  }
  const lines = listOf(params.line_items).map(lineOf);
  if (lines.length === 0)
    throw invalid('Missing required param: line_items.', 'line_items', 'parameter_missing');
  const currency = lines[0]!.currency;
  if (lines.some((line) => line.currency !== currency))
    throw invalid('All line items must be in one currency.', 'line_items');
  const amountCents = lines.reduce((sum, line) => sum + line.amount, 0);
  const minimum = minimumCents[currency] ?? 1;
  if (amountCents < minimum)
    throw invalid(
      `The total must be at least ${minimum} of the smallest unit of ${currency}.`,
      'line_items',
      'amount_too_small',
    );
  const intentData = isRecord(params.payment_intent_data) ? params.payment_intent_data : {};
  return {
    amountCents,
    currency,
    description:
      optionalString(intentData, 'description', 'payment_intent_data[description]') ??
      lines.map((line) => line.name).join(', '),
    successUrl,
    cancelUrl,
    metadata: metadataOf(params.metadata),
    intentMetadata: metadataOf(intentData.metadata, 'payment_intent_data[metadata]'),
    clientReferenceId: optionalString(params, 'client_reference_id'),
    customerEmail: optionalString(params, 'customer_email'),
  };
}
