import { describe, expect, it } from 'vitest';
import { importFeaturesCsv, validRowsOnly } from '@/lib/csv/import-csv';
import { exportFeaturesCsv } from '@/lib/csv/export-csv';
import type { Feature, Tolerance } from '@/lib/features/schema';

// An invented demo bracket: a top face (datum A), a 12H7 bore with position to A.
const header = 'record,label,type,x,y,z,axis_x,axis_y,axis_z,ref_x,ref_y,ref_z,diameter,depth,size_u,size_v,datum,characteristic,value,upper,lower,fit,material,datums';
const good = [
  header,
  'feature,1,plane,0,0,0,0,0,1,1,0,0,,,80,60,A,,,,,,,',
  'tolerance,1,,,,,,,,,,,,,,,,flatness,0.02,,,,,',
  'feature,2,bore,20,15,0,0,0,1,,,,12,10,,,,,,,,,,',
  'tolerance,2,,,,,,,,,,,,,,,,diameter,,,,12H7,,',
  'tolerance,2,,,,,,,,,,,,,,,,position,0.05,,,,MMC,A',
].join('\n');

describe('importFeaturesCsv', () => {
  it('reads a valid file into features, tolerances and datums', () => {
    const r = importFeaturesCsv(good);
    expect(r.issues).toEqual([]);
    expect(r.valid).toBe(true);
    expect(r.features.map((f) => [f.feature.label, f.feature.type, f.datum])).toEqual([['1', 'plane', 'A'], ['2', 'bore', undefined]]);
    const bore = r.features[1]?.feature;
    expect(bore?.type === 'bore' && bore.diameter).toBe(12);
    expect(r.tolerances.map((t) => [t.line, t.featureLabel, t.tolerance.characteristic])).toEqual([[3, '1', 'flatness'], [5, '2', 'diameter'], [6, '2', 'position']]);
    expect(r.tolerances[1]?.tolerance.fit).toBe('12H7');
    expect(r.tolerances[2]?.tolerance).toMatchObject({ value: 0.05, material: 'MMC', datums: ['A'] });
  });

  it('refuses a file with two bad rows and names both, line and column', () => {
    const lines = good.split('\n');
    lines[2] = 'tolerance,1,,,,,,,,,,,,,,,,flatness,-0.02,,,,,'; // negative zone
    lines[5] = 'tolerance,2,,,,,,,,,,,,,,,,position,0.05,,,,MMC,D'; // datum D not assigned
    const r = importFeaturesCsv(lines.join('\n'));
    expect(r.valid).toBe(false);
    expect(r.issues).toEqual([
      { line: 3, field: 'value', message: 'the tolerance must be greater than zero' },
      { line: 6, field: 'datums', message: 'datum D is not assigned to any feature' },
    ]);
    expect(r.rows.filter((row) => !row.ok).map((row) => row.line)).toEqual([3, 6]);
  });

  it('reports a tolerance whose feature row is bad against that feature line', () => {
    const lines = good.split('\n');
    lines[3] = 'feature,2,bore,20,15,0,0,0,1,,,,-12,10,,,,,,,,,,'; // negative diameter
    const r = importFeaturesCsv(lines.join('\n'));
    expect(r.issues[0]).toMatchObject({ line: 4, field: 'diameter' });
    expect(r.issues.slice(1)).toEqual([
      { line: 5, field: 'label', message: 'its feature "2" (line 4) has errors' },
      { line: 6, field: 'label', message: 'its feature "2" (line 4) has errors' },
    ]);
    expect(validRowsOnly(r).features.map((f) => f.feature.label)).toEqual(['1']);
  });

  it('keeps only the rows that passed when asked for valid rows only', () => {
    const lines = good.split('\n');
    lines[2] = 'tolerance,1,,,,,,,,,,,,,,,,flatness,abc,,,,,';
    const r = importFeaturesCsv(lines.join('\n'));
    expect(r.valid).toBe(false);
    expect(r.issues).toEqual([{ line: 3, field: 'value', message: '"abc" is not a number' }]);
    const kept = validRowsOnly(r);
    expect(kept.features).toHaveLength(2);
    expect(kept.tolerances.map((t) => t.line)).toEqual([5, 6]);
  });

  it('counts lines as the file has them, blank lines and quoted line breaks included', () => {
    const text = [header, '', 'feature,"plane',' top",plane,0,0,0,0,0,1,1,0,0,,,80,60,,,,,,,,', 'feature,9,cone,0,0,0,0,0,1,,,,,,,,,,,,,,,'].join('\n');
    const r = importFeaturesCsv(text);
    expect(r.features[0]?.line).toBe(3);
    expect(r.issues).toEqual([{ line: 5, field: 'type', message: expect.stringMatching(/plane, bore/) }]);
  });

  it('refuses unknown columns and a missing label column before reading rows', () => {
    const r = importFeaturesCsv('record,lable,type\nfeature,1,plane');
    expect(r.valid).toBe(false);
    expect(r.features).toEqual([]);
    expect(r.fileIssues.map((i) => i.field).sort()).toEqual(['label', 'lable']);
  });

  it('names a decimal comma, a duplicate label and a characteristic that does not fit the type', () => {
    const text = [header,
      'feature,1,plane,0,0,0,0,0,1,1,0,0,,,"80,5",60,,,,,,,,',
      'feature,2,bore,20,15,0,0,0,1,,,,12,10,,,,,,,,,,',
      'feature,2,bore,40,15,0,0,0,1,,,,12,10,,,,,,,,,,',
      'tolerance,2,,,,,,,,,,,,,,,,flatness,0.02,,,,,',
    ].join('\n');
    const r = importFeaturesCsv(text);
    expect(r.issues).toEqual([
      { line: 2, field: 'size_u', message: '"80,5": use a point as the decimal separator' },
      { line: 4, field: 'label', message: 'the label "2" is used on line 3 too' },
      { line: 5, field: 'characteristic', message: expect.stringMatching(/flatness does not apply to a bore/) },
    ]);
  });

  it('checks labels and datums against the features the part already has', () => {
    const text = [header, 'feature,7,plane,0,0,-5,0,0,1,1,0,0,,,10,10,A,,,,,,,', 'tolerance,3,,,,,,,,,,,,,,,,diameter,,0.01,0,,,'].join('\n');
    const r = importFeaturesCsv(text, { features: [{ label: '3', type: 'boss' }], datums: ['A'] });
    expect(r.issues).toEqual([{ line: 2, field: 'datum', message: 'datum A is already assigned on the part' }]);
    expect(r.tolerances).toHaveLength(1);
  });
});

describe('exportFeaturesCsv', () => {
  const u = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
  const features: Feature[] = [
    { uuid: u(1), label: '1', type: 'plane', origin: [0, 0, 0], normal: [0, 0, 1], uDir: [1, 0, 0], size: [80, 60] },
    { uuid: u(2), label: '2', type: 'bore', center: [20, 15, 0], axis: [0, 0, 1], diameter: 12, depth: 10, points: 7 },
    { uuid: u(3), label: '3', type: 'slot', center: [50, 30, 0], axis: [0, 0, 1], widthDir: [0, 1, 0], width: 8, length: 30, depth: 5 },
  ];
  const tolerances: Tolerance[] = [
    { uuid: u(11), featureUuid: u(1), characteristic: 'flatness', value: 0.02 },
    { uuid: u(12), featureUuid: u(2), characteristic: 'diameter', fit: '12H7' },
    { uuid: u(13), featureUuid: u(2), characteristic: 'position', value: 0.05, material: 'MMC', datums: ['A'] },
    { uuid: u(14), featureUuid: u(3), characteristic: 'width', upper: 0.03, lower: -0.01 },
  ];

  it('round-trips through import unchanged apart from uuids', () => {
    const text = exportFeaturesCsv(features, tolerances, { A: u(1) });
    const r = importFeaturesCsv(text);
    expect(r.issues).toEqual([]);
    expect(r.features.map((f) => f.feature)).toEqual(features.map(({ uuid: _u, ...rest }) => rest));
    expect(r.features[0]?.datum).toBe('A');
    expect(r.tolerances.map((t) => t.tolerance)).toEqual(tolerances.map(({ uuid: _u, featureUuid: _f, ...rest }) => rest));
  });

  it('refuses a tolerance whose feature is not in the list', () => {
    expect(() => exportFeaturesCsv(features.slice(0, 1), tolerances, {})).toThrow(/3 tolerance/);
  });
});
