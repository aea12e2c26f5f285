import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { buildTrend, type TrendInput } from '@/lib/trends/series';
import { trendCsv } from '@/lib/trends/trend-csv';

const run = (i: number, value: number, simulated = false): TrendInput => ({
  runUuid: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
  measuredAt: `2026-11-${String(10 + i).padStart(2, '0')}T08:00:00.000Z`,
  serial: simulated ? null : `SN-${100 + i}`,
  value,
  status: 'conforming',
  simulated,
});

const meta = { characteristic: 'diameter', label: '10', limits: { lower: 12, upper: 12.018 } };

describe('buildTrend', () => {
  it('sorts by time, numbers the runs, and keeps simulated runs out of the chart and the statistics', () => {
    const inputs = [run(3, 12.009), run(1, 12.007), run(2, 12.0, true), run(4, 12.011)];
    const t = buildTrend(meta, inputs);
    expect(t.points.map((p) => [p.index, p.serial, p.value])).toEqual([[1, 'SN-101', 12.007], [2, 'SN-103', 12.009], [3, 'SN-104', 12.011]]);
    expect(t.simulatedLeftOut).toBe(1);
    expect(t.stats.n).toBe(3);
    expect(t.stats.mean).toBeCloseTo(12.009, 12);
    expect(t.stats.cpk).toBeNull();
  });

  it('states Cpk once there are enough real runs', () => {
    const values = [12.0071, 12.0094, 12.0062, 12.0108, 12.0083, 12.0079, 12.0101, 12.0066, 12.0088, 12.0092];
    const t = buildTrend(meta, [...values.map((v, i) => run(i + 1, v)), run(12, 11.9, true)]);
    expect(t.stats.n).toBe(10);
    expect(t.stats.cpk).not.toBeNull();
    expect(t.stats.cpk).toBeLessThan(t.stats.cp ?? 0);
  });
});

describe('trendCsv', () => {
  it('exports one row per run and the statistics as notes', () => {
    const t = buildTrend(meta, [run(1, 12.007), run(2, 12.009)]);
    const csv = trendCsv(t);
    const data = csv.split('\n').filter((l) => l && !l.startsWith('#')).join('\n');
    const parsed = Papa.parse<Record<string, string>>(data, { header: true });
    expect(parsed.data).toEqual([
      { index: '1', measured_at: '2026-11-11T08:00:00.000Z', serial: 'SN-101', run_uuid: run(1, 0).runUuid, value: '12.007', status: 'conforming' },
      { index: '2', measured_at: '2026-11-12T08:00:00.000Z', serial: 'SN-102', run_uuid: run(2, 0).runUuid, value: '12.009', status: 'conforming' },
    ]);
    expect(csv).toContain('# n 2; mean 12.008; sd 0.001414');
    expect(csv).toContain('# Cp/Cpk not given (too-few-values; needs at least 10 values)');
  });
});
