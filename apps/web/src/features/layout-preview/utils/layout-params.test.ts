import { describe, expect, it } from 'vitest';
import {
  layoutParamDefaults,
  parseLayoutParams,
  toLayoutSearchParams,
  type LayoutParams,
} from './layout-params';

const defaults = parseLayoutParams(new URLSearchParams());

describe('layout screen URL params', () => {
  it('gives the defaults for an empty URL, and writes nothing back for them', () => {
    expect(defaults).toEqual(layoutParamDefaults);
    expect(toLayoutSearchParams(defaults).toString()).toBe('');
  });

  it.each<LayoutParams>([
    { ...defaults, len: `30'`, wid: `20' 6"`, roll: 12, grain: 'east-west', use: 'pet' },
    { ...defaults, redges: ['bed', 'unknown', 'hard', 'house'] },
    {
      ...defaults,
      shape: 'l-shape',
      len: '40 ft',
      wid: '30',
      nlen: `15' 0"`,
      nwid: '20.5',
      max: '75',
      grain: 'angle',
      angle: '37.5',
      ledges: ['fence', 'lawn', 'unknown', 'bed', 'hard', 'house'],
    },
    {
      ...defaults,
      shape: 'points',
      pts: '0, 0\n10, 0\n10, 8\nhole\n2, 2\n3, 2\n3, 3',
      from: '0, 4',
      to: '10, 4',
      use: 'putting',
      pedge: 'fence',
    },
  ])('survives a round trip through the URL: %o', (params) => {
    const url = `/layout?${toLayoutSearchParams(params).toString()}`;
    expect(parseLayoutParams(new URL(url, 'http://x').searchParams)).toEqual(params);
  });

  it('writes edge choices as a short list, and only for the shape that uses them', () => {
    const search = toLayoutSearchParams({
      ...defaults,
      redges: ['bed', 'unknown', 'unknown', 'unknown'],
      ledges: ['lawn', 'lawn', 'lawn', 'lawn', 'lawn', 'lawn'],
    });
    expect(search.toString()).toBe('redges=bed%2Cunknown%2Cunknown%2Cunknown');
  });

  it('reads an unknown edge word as "Not sure", and a list of the wrong length as all "Not sure"', () => {
    const params = parseLayoutParams(
      new URLSearchParams('redges=bed,gravel,,lawn&ledges=bed,bed&pedge=moat'),
    );
    expect(params.redges).toEqual(['bed', 'unknown', 'unknown', 'lawn']);
    expect(params.ledges).toEqual(layoutParamDefaults.ledges);
    expect(params.pedge).toBe('unknown');
  });

  it('keeps bad typed text as typed, so a reload shows the same message', () => {
    const params = { ...defaults, len: '3O ft' };
    expect(parseLayoutParams(toLayoutSearchParams(params)).len).toBe('3O ft');
  });

  it('leaves out fields the chosen shape and grain do not use', () => {
    const search = toLayoutSearchParams({
      ...defaults,
      shape: 'points',
      len: '99',
      angle: '12',
      pts: '0,0\n1,0\n1,1',
    });
    expect(search.has('len')).toBe(false);
    expect(search.has('angle')).toBe(false);
    expect(search.get('pts')).toBe('0,0\n1,0\n1,1');
  });

  it('falls back field by field on hand-edited values instead of failing', () => {
    const params = parseLayoutParams(
      new URLSearchParams(
        `shape=hexagon&roll=13&grain=diagonal&use=pool&len=${'9'.repeat(200)}&wid=25`,
      ),
    );
    expect(params).toEqual({ ...defaults, wid: '25' });
  });
});
