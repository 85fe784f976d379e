import { describe, expect, it } from 'vitest';
import { evaluateExposure, exemptionThresholdW, mpeLimitsMwPerCm2 } from '../../../src/core/rf/exposure';
import { rfSettings } from './fixture';
import { near } from './helpers';

const toleranceCm = 0.06;

describe('exposure worked example: 25 W CW, 14.0 MHz, dipole 2.15 dBi (REFERENCE-VALUES §2.5)', () => {
  const r = evaluateExposure(
    25,
    14e6,
    rfSettings({ antennaGainDbi: 2.15, exposureDutyFactor: 0.4, exposureOnFraction: 1, groundReflection: true }),
  );
  it('average power, EIRP and ERP', () => {
    near(r.averagePowerW, 10.0, 1e-9, 'avg');
    near(r.eirpW, 16.41, 0.005, 'EIRP');
    near(r.erpW, 10.0, 0.01, 'ERP');
  });
  it('limits at 14 MHz from 47 CFR 1.1310 Table 1', () => {
    near((r.limitControlledWPerM2 as number) / 10, 4.592, 0.001, 'controlled');
    near((r.limitGeneralWPerM2 as number) / 10, 0.9184, 0.0001, 'general');
  });
  it('distances 60.3 cm and 27.0 cm with ground reflection', () => {
    near((r.generalDistanceM as number) * 100, 60.3, toleranceCm, 'general');
    near((r.controlledDistanceM as number) * 100, 27.0, toleranceCm, 'controlled');
  });
  it('without reflection 37.7 cm and 16.9 cm', () => {
    const n = evaluateExposure(25, 14e6, rfSettings({ groundReflection: false }));
    near((n.generalDistanceM as number) * 100, 37.7, toleranceCm, 'general');
    near((n.controlledDistanceM as number) * 100, 16.9, toleranceCm, 'controlled');
  });
  it('near field λ/2π = 3.41 m, so far-field figures are estimates', () => {
    near(r.nearFieldDistanceM, 3.41, 0.005, 'λ/2π');
    expect(r.farFieldValid).toBe(false);
    expect(r.findings.some((f) => f.rule === 'exposure.near-field')).toBe(true);
  });
  it('exemption threshold 204.3 W at λ/2π; 10 W ERP exempt', () => {
    near(r.exemptionThresholdW as number, 204.3, 0.1, 'threshold');
    expect(r.exempt).toBe(true);
  });
  it('always carries the local-rules caution', () => {
    expect(r.findings.some((f) => f.rule === 'exposure.local-rules' && f.severity === 'caution')).toBe(true);
    expect(r.caution).toMatch(/Local rules/);
  });
});

describe('47 CFR 1.1310 table breaks', () => {
  it('1.8 MHz: controlled 100, general 180/3.24 = 55.6 mW/cm^2 (REFERENCE-VALUES §2.1)', () => {
    const l = mpeLimitsMwPerCm2(1.8)!;
    expect(l.controlled).toBe(100);
    near(l.general, 55.56, 0.01, 'general');
  });
  it('outside the table gives a fail finding and null distances', () => {
    const r = evaluateExposure(10, 0.1e6, rfSettings());
    expect(r.generalDistanceM).toBeNull();
    expect(r.findings.some((f) => f.severity === 'fail')).toBe(true);
  });
  it('exemption formula 3450 R^2/f^2 in 1.34–30 MHz (47 CFR 1.1307(b)(3)(i)(C))', () => {
    near(exemptionThresholdW(14, 3.41), 204.7, 0.1, 'R 3.41');
  });
});
