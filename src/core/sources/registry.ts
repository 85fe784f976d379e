// The source registry: every source a finding or recommendation can carry, as a reader would look it up.
// Findings carry a key (Finding.source: SourceKey); users only ever see the text here. Internal working notes and
// their section numbers stay in code comments and tests. Each text is one of: a published source (title, edition
// or year, clause, table or equation), "by analogy with ..." where a rule is borrowed from another field, "common
// practice, no published source", "from memory, not confirmed", or a statement that the check compares the design
// with itself or with the data the builder entered.

export type SourceStatus = 'published' | 'analogy' | 'practice' | 'memory' | 'design';

export interface SourceEntry {
  /** What a reader sees, complete (title, edition, clause; or the honest status). */
  text: string;
  status: SourceStatus;
}

const FROM_MEMORY = 'from memory, not confirmed';
const PRACTICE = 'common practice, no published source';
/** OET-65 Supplement B, Table 2: a duty-factor table for RF-exposure averaging, borrowed for heating and runtime. */
const OET65B_DUTY =
  'FCC OET Bulletin 65, Supplement B (Edition 97-01, 1997), Table 2 (conversational CW duty factor 40 %)';
const OET65 =
  'FCC OET Bulletin 65, Edition 97-01 (1997), far-field power-density equations with the 2.56 ground-reflection factor';

export const SOURCES = {
  // ---------------------------------------------------------------- the design and the builder's own data
  'design.input': {
    status: 'design',
    text: 'Allowed range of this input in this program (a plausibility limit, common practice, no published source)',
  },
  'design.consistency': {
    status: 'design',
    text: 'Consistency of the design as entered (rails, windings, loads); no published source applies',
  },
  'design.computation': {
    status: 'design',
    text: 'The computation could not be completed from the entered values; no published source applies',
  },
  'design.maker-rating': { status: 'design', text: "The maker's rating you entered, from the part's datasheet" },
  'design.simulation': {
    status: 'design',
    text: "Time-domain simulation of the rectifier and reservoir in this program (ideal source behind the winding's " +
      "resistance, diode drop and resistance); a model, not a published source",
  },
  'design.shared-winding': {
    status: 'design',
    text: 'Limitation of the simulation in this program (one winding per rail); no published source',
  },
  'design.parts-list': {
    status: 'design',
    text: "Parts-list ratings you entered, against this program's supply design",
  },
  'roles.binding': {
    status: 'design',
    text: "The parts list against this program's design: each part the design needs, bound to a parts-list line, " +
      "with the ratings you entered for that part",
  },
  'roles.winding-voltage': {
    status: 'practice',
    text: `A transformer's rated secondary voltage within 5 % of the voltage the rails were designed with ` +
      `(${PRACTICE})`,
  },
  'roles.core-al': {
    status: 'practice',
    text: `A core's inductance factor AL (L = AL N², core makers' data) within 10 % of the AL the turns were ` +
      `computed with (${PRACTICE})`,
  },
  'roles.relay-coil': {
    status: 'design',
    text: "The relay's coil current at most the one the current budget carries, and its coil voltage within 10 % of " +
      "its rail's (the tolerance is common practice, no published source)",
  },
  'roles.rf-dielectric': {
    status: 'practice',
    text: `Mica or C0G (class 1 ceramic, IEC 60384-8) capacitors in transmitter filters for stable values and low ` +
      `loss (${PRACTICE})`,
  },
  'roles.capacitor-value': {
    status: 'design',
    text: "A filter capacitor's nominal value within the tolerance you entered for the filter's yield analysis of " +
      "one of the standard values (IEC 60063 E-series) the design chose, and its own tolerance no wider; the bound " +
      "lines together give each value as many times as the design uses it",
  },
  'roles.core-size': {
    status: 'practice',
    text: `A filter core's outer and inner diameter and height within 5 % of the size the flux density and the fit ` +
      `of the turns were computed with (${PRACTICE})`,
  },
  'roles.wire': {
    status: 'practice',
    text: `The filter inductors' wire within 10 % of the diameter the fit of the turns was checked with (${PRACTICE}` +
      `); its length at least the turns times one turn round the core's rectangular section, 2 h + (OD − ID) ` +
      `(geometry), plus 50 mm of leads per inductor (${PRACTICE})`,
  },
  'roles.group-cover': {
    status: 'design',
    text: 'A grouped part of the design (fuses, bleeders, filter capacitors) needs several values: the parts-list ' +
      'lines bound to it, by the ratings you entered, give each value as many pieces per rig as the design uses',
  },
  'design.energy-balance': {
    status: 'published',
    text: 'Energy balance P_in = P_out / η (conservation of energy) with the module efficiency you entered',
  },
  // ---------------------------------------------------------------- supply
  'supply.transformer-current': {
    status: 'analogy',
    text: `Simulated secondary RMS current against the winding's rated current (a capacitor-input bridge draws about ` +
      `1.8 × I_dc RMS: a transformer maker's design note, not a standard); heating averaged with the CW duty of 40 ` +
      `% by analogy with ${OET65B_DUTY}`,
  },
  'supply.standard-values': {
    status: 'practice',
    text: `Simulation in this program; standard secondary voltages and VA sizes from an editable list of the steps ` +
      `common in small-transformer catalogues (5-300 V: laminated PCB-mount, open-frame and toroidal ranges merged, ` +
      `no maker named; ${PRACTICE}, the steps ${FROM_MEMORY})`,
  },
  'supply.inrush': {
    status: 'practice',
    text: `Toroidal transformers of a few hundred VA draw switch-on inrush of many times their rating (${PRACTICE})`,
  },
  'supply.inrush-fuse': {
    status: 'practice',
    text: `Switch-on inrush: magnetising peak about 10 x (laminated) or 30 x (toroidal) the rated primary current, ` +
      `capped at √2 V / R_primary, with half the copper loss in the primary, decaying to half each cycle; ` +
      `reservoir charging from empty by the RC step response, I²t = V² C / (2 R), reflected by the turns ratio; ` +
      `the worse of switching at a voltage zero (magnetising) and at a peak (charging) (${PRACTICE}; the multiples ` +
      `${FROM_MEMORY}). The fuse's melting I²t estimated from the minimum pre-arcing times of IEC 60127-2 sheets 3 ` +
      `and 2, and kept below 30 % of it for repeated switching (${PRACTICE})`,
  },
  'supply.keying-transient': {
    status: 'practice',
    text: `Time-domain simulation in this program (checked against ngspice) of the winding, rectifier, reservoir and ` +
      `the rail's loads by their own laws, from rest at nominal mains through a dot train: the PA on its load line P ` +
      `= (Vdd − Vsat)² / (2R) (textbook) at its operating point's efficiency, so its current goes as (Vdd − ` +
      `Vsat)² / Vdd (∝ Vdd with no saturation drop); linear regulators as constant current; switching regulators ` +
      `as constant power (energy balance); entered loads as constant current. Element and space ratios of ` +
      `Recommendation ITU-R M.1677-1 (2009), International Morse code (one unit each, from memory); dot = 1.2 / WPM ` +
      `s from the PARIS word of 50 units (${PRACTICE}); the 1 dB limit for hot first elements is ${PRACTICE}`,
  },
  'supply.shared-primary': {
    status: 'practice',
    text: `Time-domain simulation in this program of all rectified windings of one transformer together (ideal ` +
      `transformer, checked against ngspice), the primary resistance and leakage inductance shared, with half the ` +
      `copper loss and half the leakage in the primary (${PRACTICE}); a winding's leakage as entered, else its ` +
      `reactance at mains frequency taken as 0.25 × its resistance (laminated) or 0.1 × (toroidal), X = 2π f L ` +
      `(${PRACTICE})`,
  },
  'supply.secondary-tolerance': {
    status: 'practice',
    text: `A corner at low mains, key-down, with each secondary at the low end of the voltage tolerance entered for ` +
      `its transformer (the maker's figure; 5 % when not changed, ${PRACTICE})`,
  },
  'supply.tune-up-duty': {
    status: 'analogy',
    text: `Duty-factor averaging by analogy with ${OET65B_DUTY}, an RF-exposure table used here for transformer ` +
      `heating; carrier 100 %`,
  },
  'supply.half-wave': { status: 'practice', text: `Half-wave rectification puts DC through the winding (${PRACTICE})` },
  'supply.capacitor-voltage': {
    status: 'practice',
    text: `Capacitor voltage rating above the no-load peak at high mains (the maker's rating); the 20 % margin is ` +
      `${PRACTICE}`,
  },
  'supply.capacitor-ripple': {
    status: 'analogy',
    text: `Simulated capacitor RMS ripple current against the maker's ripple-current rating; heating averaged with ` +
      `the CW duty of 40 % by analogy with ${OET65B_DUTY}`,
  },
  'supply.reservoir-plan': {
    status: 'practice',
    text: `Simulation in this program; ripple estimate I / (2 f C) from the charge balance Q = C ΔV (textbook); ` +
      `voltage margin ${PRACTICE}`,
  },
  'supply.surge': {
    status: 'design',
    text: "Simulation in this program; switch-on surge = winding EMF peak / (winding + diode + ESR resistance), " +
      "Ohm's law; diode dissipation V_F I_avg + r_d I_rms² per diode (conduction-loss model of power-electronics " +
      "textbooks, from memory, not confirmed)",
  },
  'supply.fuse': {
    status: 'practice',
    text: `Rated currents from IEC 60127 (miniature fuses, rated-current series); the sizing factor is ${PRACTICE}`,
  },
  'supply.fuse-clearing': {
    status: 'memory',
    text: `Pre-arcing time limits of IEC 60127-2 (miniature fuse-links, 5 × 20 mm; 2003 + A1 + A2:2010), standard ` +
      `sheets 3 and 5 (time-lag) as quoted in makers' datasheets, sheet 2 (quick-acting) ${FROM_MEMORY}` +
      `; fault current from the winding's resistance and leakage reactance (Ohm's law, |Z| = √(R² + X²), X = 2π ` +
      `f L; a shorted reservoir through the diodes simulated over the mains cycle); clearing within 5 s and the 1.25 ` +
      `× winding-current rating are ${PRACTICE}`,
  },
  'supply.bleeder-power': {
    status: 'practice',
    text: `Dissipation P = V² / R (Joule heating, textbook) at the no-load peak at high mains; using at most 50 % ` +
      `of the resistor's power rating is ${PRACTICE}`,
  },
  'thermal.enclosure': {
    status: 'practice',
    text: `Enclosure rise ΔT = P / (U A) (sealed enclosure, natural convection; U about 5.5 W/(m² K) for painted ` +
      `steel, 6.5 for aluminium, from an enclosure vendor's sizing page); the 10 K caution level is ${PRACTICE}`,
  },
  'supply.ripple-rejection': {
    status: 'published',
    text: "Ripple rejection as defined in three-terminal regulator datasheets (input to output ripple ratio in dB at " +
      "120 Hz, with the value you entered; taken as valid at 100 Hz, from memory, not confirmed); rejection holds " +
      "only while the input trough stays above output + dropout (datasheet condition); the ripple into the regulator " +
      "from this program's rectifier simulation",
  },
  'supply.recommended-pa': {
    status: 'published',
    text: "PA load line P = (V − Vsat)² / (2 R) (textbook), scaled from the PA model's low-mains output to the " +
      "trough this program's rectifier simulation gives with the recommended winding; the 1 dB level is the PA " +
      "check's own",
  },
  'supply.no-fuse': {
    status: 'practice',
    text: `A regulator's internal current limit protects its output (${PRACTICE})`,
  },
  'supply.bleeder': {
    status: 'analogy',
    text: 'Discharge law V(t) = V0 e^(−t/RC) (RC circuit, textbook); the target of 60 V within 5 s is by analogy ' +
      'with IEC 60204-1 (safety of machinery, electrical equipment), clause 6.2.4 (clause number and values from a ' +
      'secondary source, not read); the 2 × power rating is common practice',
  },
  'supply.regulator-dropout': {
    status: 'published',
    text: 'Three-terminal regulator datasheets (78xx fixed and LM317-type adjustable): input above output by the ' +
      'dropout, about 2 V, even at the ripple trough',
  },
  'supply.regulator-max-input': {
    status: 'published',
    text: 'Regulator datasheet maximum input voltage (35 V for 5–18 V 78xx types)',
  },
  'supply.battery-end': {
    status: 'published',
    text: "Regulator dropout from three-terminal regulator datasheets, or the lowest voltage you stated for the " +
      "loads, against the battery's loaded end-of-discharge voltage",
  },
  'supply.battery-runtime': {
    status: 'analogy',
    text: `Charge balance Q = I t (textbook); the CW duty of 40 % is by analogy with ${OET65B_DUTY}, an RF-exposure ` +
      `table`,
  },
  'supply.battery-data': { status: 'design', text: 'The battery data you entered (capacity, full and end voltages)' },
  'supply.battery-curve': {
    status: 'practice',
    text: `Cell discharge curves typical of makers' data at about 0.2 C and 20-25 °C (LiFePO4 3.2 V nominal, 2.5 V ` +
      `cut-off; lead-acid 2.0 V, 1.75 V a cell at the 20-hour rate; Li-ion 3.6 V, 3.0 V; NiMH 1.2 V, 1.0 V), the ` +
      `plateau as the mean over 10-90 % of the discharge (${PRACTICE}; the figures ${FROM_MEMORY}); runtime by ` +
      `charge balance Q = I t with constant-current loads`,
  },
  'supply.battery-pa': {
    status: 'practice',
    text: `The PA's load line P = (V - Vsat)² / (2 R) (textbook) at the battery's loaded plateau and end voltages, ` +
      `the plateau from typical cell discharge curves (${PRACTICE})`,
  },
  'thermal.series-path': {
    status: 'practice',
    text: `Series thermal path Tj = Ta + P (θjc + θcs + θsa) (heat-transfer textbook model); derating to 0.8 ` +
      `Tj,max is ${PRACTICE}; dissipation averaged with the CW duty of 40 % by analogy with ${OET65B_DUTY}`,
  },
  'thermal.bridge': {
    status: 'practice',
    text: `Series thermal path Tj = Ta + P (θjc + θcs + θsa), and without a heatsink Tj = Ta + P θja ` +
      `(heat-transfer textbook relations); the heatsink needed θsa,max = (Tj,target − Ta) / P − θjc − θcs; ` +
      `the rectifier's dissipation V_F I_avg + r_d I_rms² per diode (conduction-loss model, ${FROM_MEMORY}` +
      `); derating to 0.8 Tj,max is ${PRACTICE}; Ta is the air inside the enclosure when its rise is known`,
  },
  'thermal.transformer-ambient': {
    status: 'memory',
    text: `Small mains transformers carry a rated ambient temperature (the marking ta of IEC 61558-1; 40 °C is the ` +
      `common value, ${FROM_MEMORY}); inside a warmer box the same current heats the windings more, so their current ` +
      `rating is optimistic there`,
  },
  'thermal.bridge-assumed': {
    status: 'memory',
    text: `Assumed rectifier when none is entered: a 4-8 A single-in-line bridge, θjc 2.2 K/W, θja 22 K/W in free ` +
      `air, Tj,max 150 °C (datasheet values of that package class), θcs 0.5 K/W greased (${FROM_MEMORY})`,
  },
  'supply.bleeder-regulated': {
    status: 'practice',
    text: `Discharge law V(t) = V0 e^(−t/RC) (RC circuit, textbook); a linear regulator holds its output until its ` +
      `input falls to output + dropout (datasheet dropout) and does not sink current, so the time is bounded by the ` +
      `source rail's discharge plus the output's own (${PRACTICE}); the threshold 60 V within 5 s by analogy with ` +
      `IEC 60204-1, below 60 V a 5 V spark-free level (${PRACTICE})`,
  },
  'supply.transformer-sizing': {
    status: 'practice',
    text: `Winding current rating from the simulated secondary RMS current: heating-equivalent over the CW keying ` +
      `duty (Joule heating, I² R), or the continuous key-down current when sized for tune-up; standard secondary ` +
      `voltages from a list of catalogue steps (${PRACTICE}, no maker named)`,
  },
  'thermal.assumed-mount': {
    status: 'published',
    text: "Assumed TO-220: θjc 5 K/W (78xx datasheet maximum), greased θcs about 1 K/W (a heatsink maker's " +
      "interface chart), Tj,max 125 °C (datasheet)",
  },
  'thermal.tune-up': {
    status: 'practice',
    text: `Series thermal path Tj = Ta + P (θjc + θcs + θsa) at a continuous carrier; heatsinks take minutes to ` +
      `warm up (${PRACTICE})`,
  },
  // ---------------------------------------------------------------- PA
  'pa.load-line': {
    status: 'published',
    text: 'Sinusoidal load line P = (Vdd − Vsat)² / (2R), push-pull P = 2 (Vdd − Vsat)² / R_dd (textbook); ' +
      'class E: N. O. Sokal and A. D. Sokal, "Class E — A New Class of High-Efficiency Tuned Single-Ended ' +
      'Switching Power Amplifiers", IEEE J. Solid-State Circuits SC-10(3), pp. 168–176, June 1975 (R = 0.5768 (Vdd ' +
      '− Vsat)² / P, peak drain 3.56 Vdd)',
  },
  'pa.vds': {
    status: 'published',
    text: `Peak drain voltage from the load line (2 Vdd; class E 3.56 Vdd, Sokal and Sokal, IEEE JSSC SC-10(3), ` +
      `1975); the 25 % margin is ${PRACTICE}`,
  },
  'pa.peak-current': {
    status: 'published',
    text: 'Peak device current from the load line: voltage swing / load (textbook)',
  },
  'pa.peak-current-e': {
    status: 'memory',
    text: `Class E peak switch current 2.86 × I_dc (${FROM_MEMORY}; not a published load line read here)`,
  },
  'pa.fourier': {
    status: 'published',
    text: 'Fourier series of a square wave: fundamental 4/π of the amplitude, odd harmonic n at 1/n (textbook)',
  },
  'pa.efficiency': { status: 'practice', text: `Typical drain efficiency of the amplifier class (${PRACTICE})` },
  'pa.push-pull-e': {
    status: 'practice',
    text: `Push-pull class E modelled as two single-ended halves (an assumption of this program, ${PRACTICE})`,
  },
  'pa.thermal': {
    status: 'analogy',
    text: `Series thermal path Tj = Ta + P (θjc + θcs + θsa) (textbook); target 0.8 Tj,max (${PRACTICE}); average ` +
      `dissipation with the CW duty of 40 % by analogy with ${OET65B_DUTY}`,
  },
  'pa.heat': { status: 'practice', text: `Heatsinks of a keyed transmitter run hot (${PRACTICE})` },
  'pa.swr-load-line': {
    status: 'practice',
    text: `Load line at a complex load around the SWR circle: z = (1 + Γ)/(1 − Γ) (definition of the reflection ` +
      `coefficient); classes B and C held at their drive current until the swing reaches the supply, then (when the ` +
      `low-pass filter is known) solved by harmonic balance of each device as a current source that gives way at its ` +
      `saturation drop against the filter's input impedance at each harmonic (circuit theory; ngspice agrees within ` +
      `3 % in power push-pull, 11 % single-ended), else the drain flat-topped at the rails (the upper end), and a ` +
      `12 % margin on the drain peak for the ring where the limit cuts the current (${PRACTICE}; ngspice shows ` +
      `10.5 % above 2 Vdd); class D at its square-wave voltage; conduction loss ∝ current² (${PRACTICE}); ` +
      `push-pull class D adds the leakage ring (pa.leakage-ring); with the low-pass filter known the circle is drawn ` +
      `at the antenna and each load taken through the filter as built to the PA, Z_in = (A Z_L + B)/(C Z_L + D) ` +
      `(two-port chain relations)`,
  },
  'pa.filter-input-swr': {
    status: 'practice',
    text: `The SWR circle drawn at the antenna and each of its loads taken through the low-pass filter as built to ` +
      `the PA, Z_in = (A Z_L + B)/(C Z_L + D) (two-port chain relations, circuit theory); the input reflection a ` +
      `lossless Chebyshev filter has by design at its ripple peaks, |Γ|² = 1 − 10^(−ripple/10) (power ` +
      `conservation |S11|² + |S21|² = 1 with the passband's least transmission; textbook relations of filter ` +
      `theory); a caution when the parts as fitted exceed that (or the design's own SWR at the operating frequency), ` +
      `when the output moves by more than the power check's 1 dB, or when the drain peak comes within the drain ` +
      `check's 1.25 × of the rating (${PRACTICE})`,
  },
  'pa.clip-balance': {
    status: 'design',
    text: `Harmonic balance of a class B/C stage at its clipping load, in this program: each device a current source ` +
      `(its cosine drive pulse) that gives way at its saturation drop, against the load at the fundamental and the ` +
      `low-pass filter's input impedance at each harmonic (with the device output capacitance when entered); the ` +
      `drain's harmonics reach the antenna through the filter from a voltage at its input (two-port chain relations, ` +
      `circuit theory). Checked against ngspice (push-pull class B and C, 5-pole capacitor-input filter, SWR 2): ` +
      `power within 3 %, 3rd harmonic within 1.3 dB. The output transformer's leakage inductance is not modelled, ` +
      `so the flat-topped drain stays the harmonic rows' worst end (${PRACTICE})`,
  },
  'pa.leakage-ring': {
    status: 'published',
    text: "Undamped series LC from its initial conditions (circuit theory, textbook): at a hard switching edge the " +
      "drain steps by the load-line swing through the output transformer's leakage inductance L into the device " +
      "output capacitance C with the turn-off current I in L, peak overshoot √(ΔV² + (I Z0)²) and ring current " +
      "√((ΔV/Z0)² + I²), Z0 = √(L/C); losses and snubbers only lower them (an upper bound)",
  },
  'pa.class-e-sim': {
    status: 'design',
    text: `Time-domain simulation of the class-E stage in this program: switch with Rds(on) and body diode, shunt C1 ` +
      `= 0.1836/(ωR) and series excess reactance 1.1525 R for 50 % duty (nominal design after N. O. Sokal and A. D. ` +
      `Sokal, IEEE JSSC SC-10(3), 1975; the two constants ${FROM_MEMORY}), loaded Q 30, choke 100 R (${PRACTICE}` +
      `); at the design load it reproduces the published 3.56 Vdd peak and R = 0.5768 Vdd²/P; results scale this ` +
      `program's matched figures`,
  },
  'pa.drain-clamp': {
    status: 'practice',
    text: `A drain clamp (TVS or zener, drain to ground) holds the drain to its clamping voltage; the power it takes ` +
      `estimated with the unclamped drain as a cosine swing about the supply (v = Vdd + (Vpk − Vdd) cos θ, ` +
      `conducting a share θc/π of the cycle, cos θc = (Vc − Vdd)/(Vpk − Vdd)) carrying at most the stage's ` +
      `peak device current: P ≤ Vc Ipk θc/π, and at most the stage's DC input at that load (energy balance), an ` +
      `upper estimate (${PRACTICE})`,
  },
  'pa.protection': {
    status: 'practice',
    text: `Protection of a PA against mismatch: drain clamp (TVS or zener), SWR or current foldback of the drive or ` +
      `supply, or a device rated above the worst case (${PRACTICE})`,
  },
  'pa.harmonics-class-c': {
    status: 'memory',
    text: `Fourier coefficients of a cosine-pulse (reduced-conduction-angle) drain current: α0 = (sin θ − θ cos ` +
      `θ)/(π (1 − cos θ)), α1 = (θ − sin θ cos θ)/(π (1 − cos θ)), αn = 2 (sin nθ cos θ − n cos ` +
      `nθ sin θ)/(π n (n² − 1)(1 − cos θ)), θ = half the conduction angle; tabulated in H. L. Krauss, C. ` +
      `W. Bostian and F. H. Raab, Solid State Radio Engineering (Wiley, 1980) (equations ${FROM_MEMORY}; chapter and ` +
      `table not confirmed)`,
  },
  'pa.harmonics-rectangular': {
    status: 'published',
    text: 'Fourier series of a rectangular wave of duty D: harmonic n relative to the fundamental |sin(nπD)| / (n ' +
      '|sin(πD)|) (textbook)',
  },
  'pa.waveform-pulse': {
    status: 'memory',
    text: `Drain-current cosine pulse (Fourier coefficients as tabulated in H. L. Krauss, C. W. Bostian and F. H. ` +
      `Raab, Solid State Radio Engineering, Wiley 1980, ${FROM_MEMORY}), from the edge of saturation to hard ` +
      `saturation (the pulse flattened at the load line's limit; class B then becomes the square wave of the ` +
      `textbook Fourier series); the band's extremes and the DC current scaled with the pulse's mean value are ` +
      `${PRACTICE}`,
  },
  'pa.trapezoid': {
    status: 'memory',
    text: `Spectrum of a trapezoidal pulse train, c_n = 2A (τ/T) |sinc(nπτ/T)| |sinc(nπ t_r/T)| (C. R. Paul, ` +
      `Introduction to Electromagnetic Compatibility, 2nd ed., Wiley 2006, §3.2; ${FROM_MEMORY}); the 10 ns ` +
      `transition time assumed when none is entered is ${PRACTICE}`,
  },
  'pa.class-e-harmonics': {
    status: 'design',
    text: `Harmonics of the load current of this program's class-E simulation (Fourier series over one steady-state ` +
      `cycle); the series network's loaded Q from 5 to 30 is ${PRACTICE}`,
  },
  'pa.waveform-dc': {
    status: 'practice',
    text: `DC input from the stage's waveform: the drain efficiency at most the ideal waveform's (energy balance), ` +
      `the losses it leaves out scaled with its DC input (${PRACTICE})`,
  },
  'pa.harmonics-imbalance': {
    status: 'practice',
    text: `Even harmonics of a push-pull stage set by its imbalance, from the typical and worst residual you state ` +
      `(${PRACTICE})`,
  },
  'spurious.construction-floor': {
    status: 'practice',
    text: `Harmonic suppression of a home-built filter and layout floors near −60 to −70 dBc (coupling around ` +
      `the filter, ground currents); levels predicted below −70 dBc are shown as limited by construction ` +
      `(${PRACTICE})`,
  },
  // ---------------------------------------------------------------- filter, relay, keying
  'lpf.abcd': {
    status: 'published',
    text: 'Chain-matrix (ABCD) analysis of the ladder as built, with component Q, between 50 Ω terminations ' +
      '(circuit theory, textbook)',
  },
  'lpf.swr-design': {
    status: 'practice',
    text: 'Input SWR of the ladder as built by chain-matrix (ABCD) analysis (circuit theory, textbook), against what ' +
      'the response allows by design: a lossless Chebyshev filter reaches |Γ|² = 1 − 10^(−ripple/10) at its ' +
      'ripple peaks (power conservation |S11|² + |S21|² = 1 with the passband\'s least transmission; textbook ' +
      'relations of filter theory), else the design values\' own SWR across the band; a caution above SWR 1.3 only ' +
      `where the parts as fitted exceed that, a fail above 2 (${PRACTICE})`,
  },
  'lpf.pa-source': {
    status: 'published',
    text: "Filter rejection of each harmonic from the PA's own source impedance by the two-port chain relation " +
      "V_L/E_s = Z_L/(A Z_L + B + Z_s (C Z_L + D)) (circuit theory, textbook; Pozar, Microwave Engineering, 4th ed. " +
      "2012, section 4.4, from memory): class D a voltage source behind Rds(on) through the transformer, class B/C " +
      "an ideal current source, class E its series-tuned network (loaded Q 30, common practice, no published " +
      "source); transformer or network taken as ideal at every harmonic",
  },
  'lpf.snap': {
    status: 'practice',
    text: `Nearest standard component values (IEC 60063 E-series); the tolerance for flagging a large step is ` +
      `${PRACTICE}`,
  },
  'line.standing-wave': {
    status: 'published',
    text: 'Standing-wave maxima on a lossless line: V_max = √(P Z0 S), I_max = √(P S / Z0) (transmission-line ' +
      'theory, textbook)',
  },
  'relay.keying': {
    status: 'practice',
    text: `PARIS word convention: one word = 50 dot units, so a dot lasts 1.2 / WPM seconds; keeping the delay under ` +
      `half a dot is ${PRACTICE}`,
  },
  'keying.rise-time': {
    status: 'published',
    text: 'W. G. Pierpont, The Art and Skill of Radio-Telegraphy, 2nd revised edition, chapter 24 (keying edges ' +
      'shaped over 5–7 ms give a clean, readable signal): an operating guide, not a regulation; key-click levels ' +
      'from the Fourier series of a steady dot train (FFT, Cooley and Tukey, Math. Comp. 19, 1965)',
  },
  'keying.necessary-bandwidth': {
    status: 'published',
    text: 'ITU Radio Regulations, Appendix 1 (and Recommendation ITU-R SM.1138), Part B, continuous-wave telegraphy: ' +
      'Bn = B K, K = 5 for fading and 3 for non-fading circuits (example: 25 words per minute, B = 20, K = 5, 100 ' +
      'Hz; checked against a quotation of the text, not the text itself); B = WPM / 1.2 from the PARIS word of 50 ' +
      'units (common practice); occupied bandwidth as in RR No. 1.153 (99 % of the mean power)',
  },
  'keying.first-element': {
    status: 'practice',
    text: `The first element after the sequencer's transmit delay, with the keyed envelope's edges: width at half ` +
      `amplitude dot − delay, time above 90 % from the edge shapes (${PRACTICE})`,
  },
  'core.emf-equation': {
    status: 'published',
    text: "Transformer EMF equation E = 4.44 f N Ae B_peak (Faraday's law for a sinusoidal voltage, textbook), with " +
      "the inductor's voltage from the lossless ladder at the worst SWR and the highest output; toroid Ae and le " +
      "from its dimensions as in IEC 60205 (from memory, not confirmed); the flux limit is the maker's figure you " +
      "entered",
  },
  'core.winding-fit': {
    status: 'memory',
    text: `Turns of one layer inside a toroid: π (ID − d) / d, wire centres one diameter apart on a circle of ` +
      `diameter ID − d (geometry; ${FROM_MEMORY} as a published rule)`,
  },
  'core.self-resonance': {
    status: 'memory',
    text: `Self-resonance f = 1 / (2π √(LC)) (textbook) with about 2 pF across a small single-layer toroidal ` +
      `winding and about 5 nH of lead on a leaded capacitor (${FROM_MEMORY}); judged against the 5th harmonic ` +
      `(${PRACTICE})`,
  },
  'lpf.capacitor-current': {
    status: 'design',
    text: "The capacitor RF current rating you entered (RMS), against the current through each capacitor from the " +
      "lossless ladder at the worst SWR and the highest output (Kirchhoff's laws, I = V ωC)",
  },
  'core.window-fit': {
    status: 'practice',
    text: `Turns that fit a core's winding window: about 40 % of the window filled by round enamelled wire, each ` +
      `turn taking π d²/4 (${PRACTICE})`,
  },
  'core.output-transformer-flux': {
    status: 'published',
    text: "Transformer EMF equation E = 4.44 f N Ae B_peak (Faraday's law for a sinusoidal voltage, textbook), with " +
      "the primary's RMS voltage √(P R) from the PA's highest output into its design load (high mains or a full " +
      "battery) and the lowest frequency of the operating band (the fundamental only: a square drain voltage carries " +
      "about 23 % more flux); Ae and the flux limit are those of the catalog core you chose",
  },
  'network.pi': {
    status: 'memory',
    text: `Pi-network design by a virtual resistance: R_v = R_high / (Q² + 1), Q_2 = √(R_low / R_v − 1), X_C1 = ` +
      `R_high / Q, X_C2 = R_low / Q_2, X_L = R_v (Q + Q_2) (two back-to-back L networks through R_v; textbook ` +
      `relations, e.g. C. Bowick, RF Circuit Design, 1982, ch. 4; ${FROM_MEMORY})`,
  },
  'network.push-pull': {
    status: 'memory',
    text: `A push-pull stage's output network designed for the drain-to-drain load (each half sees half of it) with ` +
      `a balun to the unbalanced network; the network equations as for the L or pi network (${FROM_MEMORY})`,
  },
  'lpf.capacitor-rating': {
    status: 'design',
    text: 'The capacitor voltage rating you entered, against the RF peak across each capacitor from the lossless ' +
      'ladder at the worst SWR and the highest output; a caution above 70 % of it (common practice, no published ' +
      'source)',
  },
  // ---------------------------------------------------------------- spurious emissions
  'spurious.us-97-307d': {
    status: 'published',
    text: '47 CFR 97.307(d) (US amateur service): spurious emissions below 30 MHz at least 43 dB below the mean ' +
      'power of the fundamental (transmitters installed after 1 January 2003)',
  },
  'spurious.us-97-307e': {
    status: 'published',
    text: '47 CFR 97.307(d) covers below 30 MHz only; 97.307(e) sets the 30–225 MHz limits',
  },
  'spurious.itu-app3': {
    status: 'memory',
    text: `ITU Radio Regulations, Appendix 3 (amateur services below 30 MHz): 43 + 10 log10(P) dB, or 50 dB, ` +
      `whichever is less stringent (the formula is ${FROM_MEMORY}; the Appendix 3 table was not read)`,
  },
  'spurious.itu-range': {
    status: 'memory',
    text: `ITU Radio Regulations, Appendix 3: the amateur row used here covers below 30 MHz only (${FROM_MEMORY})`,
  },
  'spurious.measure': {
    status: 'practice',
    text: `Predictions from idealised waveforms; measure the finished transmitter (${PRACTICE}); local rules and ` +
      `your licence govern`,
  },
  // ---------------------------------------------------------------- RF exposure
  'exposure.fcc-distance': {
    status: 'published',
    text: `${OET65}, with the limits of 47 CFR 1.1310(e)(1), Table 1 (occupational/controlled and general ` +
      `population/uncontrolled); duty factor from ${OET65B_DUTY}`,
  },
  'exposure.fcc-range': {
    status: 'published',
    text: '47 CFR 1.1310(e)(1), Table 1: limits defined from 0.3 MHz to 100 GHz',
  },
  'exposure.fcc-exemption': {
    status: 'published',
    text: '47 CFR 1.1307(b)(3)(i)(C), Table 1 (single RF source exemption thresholds, valid at or beyond λ/2π)',
  },
  'exposure.icnirp-distance': {
    status: 'published',
    text: `ICNIRP (1998), "Guidelines for limiting exposure to time-varying electric, magnetic, and electromagnetic ` +
      `fields (up to 300 GHz)", Health Physics 74(4):494–522: reference levels for the general public (the levels ` +
      `of EU Council Recommendation 1999/519/EC) and occupational exposure, applied with the far-field method of ` +
      `${OET65}`,
  },
  'exposure.icnirp-range': {
    status: 'published',
    text: 'ICNIRP (1998) reference levels: the electric-field levels used here are defined from 1 MHz to 400 MHz',
  },
  'exposure.near-field': {
    status: 'published',
    text: `λ/2π (= 47.7 / f in MHz, metres) bounds the reactive near field (47 CFR 1.1307(b)(3)(i)(C)); the ` +
      `far-field equations of ${OET65} are estimates inside it`,
  },
  'exposure.local-rules': {
    status: 'practice',
    text: 'Local rules and your licence conditions govern RF exposure; this is a planning estimate',
  },
  // ---------------------------------------------------------------- mains
  'mains.ansi-c84-1': {
    status: 'memory',
    text: `ANSI C84.1 (electric power systems and equipment, voltage ratings, 60 Hz), Range B utilization voltage ` +
      `for 120 V nominal: 106–127 V, −11.7 % / +5.8 % (values ${FROM_MEMORY}; the table was not read)`,
  },
  'mains.iec-60038': {
    status: 'published',
    text: 'IEC 60038 (IEC standard voltages): 230 V ± 10 % at the supply terminals (207–253 V)',
  },
  // ---------------------------------------------------------------- costing
  'cost.practice': { status: 'practice', text: `Costing arithmetic from your offers (${PRACTICE})` },
  'cost.stage-coverage': {
    status: 'design',
    text: 'Your parts list compared with the stages of your design; no published source applies',
  },
} as const satisfies Record<string, SourceEntry>;

export type SourceKey = keyof typeof SOURCES;

/** The text a reader sees for a source key. */
export function sourceText(key: SourceKey): string {
  return SOURCES[key].text;
}

/** True for a string that is a registry key (for data read from outside core, e.g. a stored report). */
export function isSourceKey(key: string): key is SourceKey {
  return Object.prototype.hasOwnProperty.call(SOURCES, key);
}
