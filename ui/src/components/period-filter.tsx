import { Button, FormGroup, HTMLSelect } from '@blueprintjs/core';
import type { PeriodFilter as Filter } from '../lib/period';
import { TextField } from './text-field';
import './period-filter.css';

/**
 * From, to and ruleset version (used by the insights, the outcomes log and, without the version,
 * the case list). Each change applies at once (the page keeps the filter in its address, so it
 * survives a reload and can be shared). Without `versions` there is no version choice.
 */
export function PeriodFilter({
  value,
  onChange,
  versions,
  allVersionsLabel = 'All versions',
  idPrefix = 'period',
  clearable = true,
}: {
  value: Filter;
  onChange: (next: Filter) => void;
  versions?: readonly { version: string; active: boolean }[];
  allVersionsLabel?: string;
  idPrefix?: string;
  /** Its own "Clear" button (a page with one "Clear filters" for everything turns it off). */
  clearable?: boolean;
}) {
  const set = (key: keyof Filter, v: string) => onChange({ ...value, [key]: v || undefined });
  const invalid = value.from && value.to && value.from > value.to ? ['The first day comes after the last.'] : [];
  return (
    <div className="fw-period-filter" role="group" aria-label={versions ? 'Period and version' : 'Period'}>
      <TextField id={`${idPrefix}-from`} label="From" type="date" value={value.from ?? ''} onChange={(v) => set('from', v)} />
      <TextField id={`${idPrefix}-to`} label="To (included)" type="date" value={value.to ?? ''} onChange={(v) => set('to', v)} errors={invalid} />
      {versions && (
        <FormGroup label="Ruleset version" labelFor={`${idPrefix}-version`}>
          <HTMLSelect id={`${idPrefix}-version`} large fill value={value.version ?? ''} onChange={(e) => set('version', e.currentTarget.value)}>
            <option value="">{allVersionsLabel}</option>
            {versions.map((v) => (
              <option key={v.version} value={v.version}>
                {v.version}
                {v.active ? ' (active)' : ''}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
      )}
      {clearable && (value.from || value.to || value.version) && (
        <div className="fw-period-filter-actions">
          <Button className="fw-touch" size="large" variant="minimal" text="Clear" onClick={() => onChange({})} />
        </div>
      )}
    </div>
  );
}
