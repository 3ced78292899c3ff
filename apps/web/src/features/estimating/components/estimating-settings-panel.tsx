import { useState } from 'react';
import type { TakeoffSettingView, UpdateEstimatingSettingsInput } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { ApiError } from '../../../lib/api-client';
import { useEstimatingSettings, useUpdateEstimatingSettings } from '../api/estimating-settings';
import { sectionTitle, settingLabel, settingText } from '../utils/setting-label';
import { RatesForm } from './rates-form';

/** `{ base: { depthIn: value } }` from `base.depthIn`. */
function patchFor(path: string, value: unknown): UpdateEstimatingSettingsInput {
  const keys = path.split('.').reverse();
  const takeoff = keys.reduce<unknown>((inner, key) => ({ [key]: inner }), value);
  return { takeoff: takeoff as Record<string, never> };
}

function SettingRow({ field, canManage }: { field: TakeoffSettingView; canManage: boolean }) {
  const update = useUpdateEstimatingSettings();
  const [text, setText] = useState(String(field.value));
  const [error, setError] = useState<string | null>(null);
  const { label } = settingLabel(field.path);
  const inputId = `setting-${field.path}`;
  const isEditable =
    canManage && (typeof field.value === 'number' || typeof field.value === 'string');

  async function save(value: unknown) {
    setError(null);
    try {
      const view = await update.mutateAsync(patchFor(field.path, value));
      const saved = view.takeoffFields.find((f) => f.path === field.path);
      setText(String(saved?.value ?? value));
    } catch (failure) {
      setError(failure instanceof ApiError ? failure.message : 'Not saved');
    }
  }

  return (
    <li className="grid gap-2 border-t border-line px-3 py-2 sm:grid-cols-[14rem_auto_1fr] sm:gap-4">
      <div>
        <label htmlFor={inputId}>{label}</label>
        {field.isOverridden ? <span className="ml-1 text-sm font-semibold">(changed)</span> : null}
      </div>
      <div>
        {isEditable ? (
          <form
            className="flex gap-2"
            onSubmit={(event) => {
              event.preventDefault();
              void save(typeof field.standard === 'number' ? Number(text) : text);
            }}
          >
            <input
              id={inputId}
              value={text}
              inputMode={typeof field.standard === 'number' ? 'decimal' : undefined}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${inputId}-error` : undefined}
              className="w-28 rounded border border-line-strong px-2 py-1"
              onChange={(event) => setText(event.target.value)}
            />
            <Button type="submit" variant="secondary" isBusy={update.isPending}>
              Save<span className="sr-only"> {label}</span>
            </Button>
          </form>
        ) : (
          <span id={inputId}>{settingText(field.value)}</span>
        )}
        {error ? (
          <p id={`${inputId}-error`} className="mt-1 text-sm text-brick-700">
            {error}
          </p>
        ) : null}
      </div>
      <div>
        <span className="block">Standard: {settingText(field.standard)}</span>
        <span className="block text-sm text-ink-muted">{field.source}</span>
        {canManage && field.isOverridden ? (
          <Button variant="quiet" onClick={() => void save(null)}>
            Reset to standard<span className="sr-only"> for {label}</span>
          </Button>
        ) : null}
      </div>
    </li>
  );
}

/** Every takeoff default with its standard value and source, plus markup, tax and deposit. */
export function EstimatingSettingsPanel({ canManage }: { canManage: boolean }) {
  const settings = useEstimatingSettings();
  const sections = new Map<string, TakeoffSettingView[]>();
  for (const field of settings.takeoffFields) {
    const { section } = settingLabel(field.path);
    sections.set(section, [...(sections.get(section) ?? []), field]);
  }
  return (
    <div className="flex flex-col gap-6">
      <RatesForm settings={settings} canManage={canManage} />
      {[...sections].map(([section, fields]) => (
        <div key={section} className="rounded-lg border border-line bg-white">
          <h3 className="bg-sand-100 px-3 py-2 font-semibold">{sectionTitle(section)}</h3>
          <ul>
            {fields.map((field) => (
              <SettingRow key={field.path} field={field} canManage={canManage} />
            ))}
          </ul>
        </div>
      ))}
    </div>
  );
}
