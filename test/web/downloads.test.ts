import { describe, it, expect } from 'vitest';
import { demoApp } from '../helpers/app';

describe('downloads: SPICE netlists and CSV', () => {
  it('gives each rectified rail at low mains and key-down current, with .meas lines', async () => {
    const { get } = await demoApp();
    const res = await get('/projects/demo-club-30m/supply/rail-pa/netlist.cir');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-disposition')).toContain('rail-pa-low-mains-keydown.cir');
    const text = await res.text();
    expect(text).toContain('mains x0.9'); // 120 V demo, low tolerance 10 %
    expect(text).toMatch(/\.meas tran vmin MIN/i);
    expect(text.trim().endsWith('.end')).toBe(true);
  });

  it('gives the as-built filter for AC analysis', async () => {
    const { get } = await demoApp();
    const res = await get('/projects/demo-club-30m/stages/st-lpf/lpf.cir');
    expect(res.status).toBe(200);
    expect(await res.text()).toMatch(/\.ac|ac /i);
  });

  it('refuses a regulated rail and unknown ids', async () => {
    const { get } = await demoApp();
    expect((await get('/projects/demo-club-30m/supply/rail-13v8/netlist.cir')).status).toBe(404);
    expect((await get('/projects/demo-club-30m/supply/nope/netlist.cir')).status).toBe(404);
    expect((await get('/projects/demo-club-30m/stages/st-rx/lpf.cir')).status).toBe(404);
  });

  it('the CSV export refuses an unknown separator with a message', async () => {
    const { get } = await demoApp();
    const res = await get('/projects/demo-club-30m/bom.csv?sep=pipe');
    expect(res.status).toBe(400);
    expect(await res.text()).toContain('sep must be "comma" or "semicolon"');
    expect((await get('/projects/demo-club-30m/bom.csv?sep=semicolon')).status).toBe(200);
  });
});
