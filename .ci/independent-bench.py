#!/usr/bin/env python3
"""A second, independent bench generator (invented data) for testing Mobident: written apart
from `mobident simulate`, with its own modelling choices, to catch the tool fitting its own simulator.
Needs numpy and scipy; not run by CI. Example: python3 .ci/independent-bench.py --profile rough --seed 23 --out /tmp/rough

Own modelling choices (deliberately unlike the tool's simulator):
  * zone = Gaussian (sigma_t = t/sqrt(N)), or for concentrated zones an exponnorm
    (tailing) or bi-Gaussian (fronting) with the SAME centroid and area;
  * the whole optical signal then passes a first-order detector filter (time constant tau),
    so every zone, the marker included, tails and its centroid moves later by tau;
  * noise = detector-filtered white noise + 1/f (pink) noise, + random walk in 'rough';
  * baseline = offset + linear drift + one step or one slow hump;
  * point sampling at 2/5/10/20 Hz; single-sample spikes.
Physics: mu_app = mu_eff + mu_eof (1e-9 m^2/(V s)); t = Ld*Lt/(mu_app*1e-9*V) (+ramp/2);
all mobilities, EOF included, scale by (1 + 0.023*(T_actual - 25)).
Truth: time_s = physical centroid time (before the detector filter), mobility at 25 C,
height_sd = apex of the undispersed (Gaussian, same area) zone / white-noise SD.
"""
import argparse, os, math
import numpy as np
from scipy.signal import lfilter
from scipy.stats import exponnorm

TAG = "# Invented bench data (.ci/independent-bench.py, profile {p}, seed {s}): no real samples, nothing measured."
TRACE_TAG = "# invented trace from .ci/independent-bench.py (profile {p}, seed {s}); not a measurement"

# method: (Lt cm, Ld cm, kV, nominal EOF, detection, co-ion mobility, panel)
METHODS = {
    "ANI-P": dict(Lt=80, Ld=70, kv=-20, eof=-45.0, det="indirect", coion=-74.0, panel=[
        ("bromide", -81.4), ("chloride", -79.6), ("sulfate", -77.0), ("nitrite", -71.8),
        ("nitrate", -70.3), ("chlorate", -65.1), ("fluoride", -56.8), ("formate", -55.6),
        ("phosphate", -45.2)]),
    "ORG-Q": dict(Lt=64, Ld=56, kv=-25, eof=-38.0, det="direct", coion=-45.0, panel=[
        ("tartrate", -58.6), ("malonate", -57.4), ("succinate", -51.9), ("phthalate", -50.6),
        ("glycolate", -42.8), ("lactate", -36.2), ("benzoate", -33.4), ("sorbate", -32.6)]),
    "CAT-R": dict(Lt=70, Ld=60, kv=20, eof=50.0, det="indirect", coion=62.0, panel=[
        ("rubidium", 80.6), ("potassium", 78.4), ("ammonium", 76.2), ("barium", 66.1),
        ("strontium", 61.5), ("calcium", 60.2), ("magnesium", 55.0), ("sodium", 52.4),
        ("nickel", 50.9), ("lithium", 40.3)]),
}

PROFILES = {
    # dT_sample, dT_std_session, eof_drift, fs choices, tau range, pink/white, randomwalk SD-units,
    # drift SD-units, step/hump SD-units, spikes max, skew from height, skew strength, ramps, weak marker share
    "clean":  dict(dT=0.0, dTstd=0.0, eof=0.03, fs=[10, 20], tau=(0.1, 0.3), pink=0.0, rw=0.0,
                   drift=2, bump=0, spikes=0, skew_from=1e9, skew=0.0, ramps=[0], weak=0.0,
                   nomark=0.0, foreign=(0, 0), hmin=100, hmax=500, nplate=(150e3, 300e3)),
    "gentle": dict(dT=0.5, dTstd=0.0, eof=0.04, fs=[5, 10, 20], tau=(0.1, 0.3), pink=0.3, rw=0.0,
                   drift=5, bump=4, spikes=1, skew_from=300, skew=0.6, ramps=[0], weak=0.0,
                   nomark=0.1, foreign=(0, 1), hmin=3, hmax=1000, nplate=(80e3, 300e3)),
    "rough":  dict(dT=1.0, dTstd=0.3, eof=0.10, fs=[2, 5, 10, 20], tau=(0.1, 0.5), pink=1.0, rw=0.5,
                   drift=30, bump=15, spikes=3, skew_from=100, skew=1.5, ramps=[0, 0, 0, 3, 5], weak=0.1,
                   nomark=0.1, foreign=(0, 2), hmin=3, hmax=1000, nplate=(50e3, 300e3)),
}


def mig_time(mu_eff, mu_eof, Lt, Ld, kv, ramp):
    mu_app = (mu_eff + mu_eof) * 1e-9
    return (Ld / 100) * (Lt / 100) / (mu_app * kv * 1e3) + ramp / 2.0


def zone_profile(tf, t0, sigma, area, skew_dir, K, front="bigauss"):
    """Area-normalised zone with centroid t0. skew_dir +1 tail, -1 front, 0 Gaussian.
    front: 'bigauss' (left half wider) or 'exponential' (exponnorm mirrored in time)."""
    if skew_dir == 0 or K <= 0:
        return area * np.exp(-0.5 * ((tf - t0) / sigma) ** 2) / (sigma * math.sqrt(2 * math.pi))
    if skew_dir > 0:  # exponnorm tail; mean = loc + K*sigma
        loc = t0 - K * sigma
        return area * exponnorm.pdf(tf, K, loc=loc, scale=sigma)
    if front == "exponential":  # mirrored exponnorm; mean = loc - K*sigma
        loc = t0 + K * sigma
        return area * exponnorm.pdf(2 * loc - tf, K, loc=loc, scale=sigma)
    # fronting: bi-Gaussian, left wider
    sL, sR = sigma * (1 + K), sigma
    mu = t0 - math.sqrt(2 / math.pi) * (sR - sL)  # centroid = mu + sqrt(2/pi)(sR-sL)
    norm = 2.0 / (math.sqrt(2 * math.pi) * (sL + sR))
    s = np.where(tf < mu, sL, sR)
    return area * norm * np.exp(-0.5 * ((tf - mu) / s) ** 2)


def pink(rng, n):
    w = rng.standard_normal(n)
    f = np.fft.rfftfreq(n)
    F = np.fft.rfft(w)
    f[0] = f[1]
    F /= np.sqrt(f)
    x = np.fft.irfft(F, n)
    x -= x.mean()
    return x / x.std()


def simulate_run(rng, P, m, zones, mu_eof_act, ramp, fs, tau, tend, sigma_w, weak_marker):
    """zones: list of (kind, name, mu25, mu_act, height_sd). Returns t, y, truth rows."""
    dtf = min(0.01, 1.0 / (10 * fs))
    tf = np.arange(0, tend + 2, dtf)
    clean = np.zeros_like(tf)
    truth = []
    Nbase = rng.uniform(*P["nplate"])
    allz = list(zones)
    hm = rng.uniform(50, 300) if not weak_marker else rng.uniform(8, 20)
    allz.append(("marker", "", 0.0, 0.0, hm))
    for kind, name, mu25, mu_act, h in allz:
        t0 = mig_time(mu_act, mu_eof_act, m["Lt"], m["Ld"], m["kv"], ramp)
        N = Nbase * rng.uniform(0.8, 1.2)
        sigma = (t0 - ramp / 2) / math.sqrt(N)
        area = h * sigma_w * sigma * math.sqrt(2 * math.pi)
        sd, K = 0, 0.0
        if kind != "marker" and h >= P["skew_from"]:
            K = P["skew"] * min(1.0, math.log10(h / P["skew_from"]) + 0.3) * rng.uniform(0.5, 1.5)
            sd = 1 if abs(mu_act) < abs(m["coion"]) else -1   # faster than co-ion fronts
        clean += zone_profile(tf, t0, sigma, area, sd, K, P.get("front", "bigauss"))
        truth.append((kind, name, t0, mu25 if kind != "marker" else 0.0, h))
    sign = -1 if m["det"] == "indirect" else 1
    clean *= sign
    a = math.exp(-dtf / tau)
    filt = lfilter([1 - a], [1, -a], clean)
    # point sampling
    n = int(tend * fs) + 1
    t = np.arange(n) / fs
    y = np.interp(t, tf, filt)
    # noise: white through detector filter, rescaled
    a2 = math.exp(-1.0 / (fs * tau))
    wn = lfilter([1 - a2], [1, -a2], rng.standard_normal(n + 200))[200:]
    wn = wn / wn.std() * sigma_w
    y += wn
    if P["pink"] > 0:
        y += pink(rng, n) * sigma_w * P["pink"] * rng.uniform(0.3, 1.0)
    if P["rw"] > 0:
        rw = np.cumsum(rng.standard_normal(n)); rw -= np.linspace(rw[0], rw[-1], n)
        y += rw / (np.abs(rw).max() + 1e-12) * sigma_w * P["rw"] * rng.uniform(2, 10)
    # baseline
    y += rng.uniform(-2, 8) * sigma_w * 20 + rng.uniform(-1, 1) * P["drift"] * sigma_w * t / tend
    if P["bump"] > 0:
        if rng.random() < 0.5:
            ts = rng.uniform(0.1, 0.9) * tend
            amp = rng.uniform(-1, 1) * P["bump"]
            y += (t > ts) * amp * sigma_w
            base_note = "step %.1f s %+.1f SD" % (ts, amp)
        else:
            tc, w = rng.uniform(0.1, 0.9) * tend, rng.uniform(20, 80)
            amp = rng.uniform(-1, 1) * P["bump"] * 2
            y += np.exp(-0.5 * ((t - tc) / w) ** 2) * amp * sigma_w
            base_note = "hump %.1f s w %.0f s %+.1f SD" % (tc, w, amp)
    else:
        base_note = "none"
    # spikes
    for _ in range(rng.integers(0, P["spikes"] + 1)):
        i = rng.integers(int(0.05 * n), n - 5)
        y[i] += rng.choice([-1, 1]) * rng.uniform(20, 200) * sigma_w
        truth.append(("spike", "", t[i], None, None))
    return t, y, truth, base_note


def write_trace(path, t, y, P, seed, txt):
    with open(path, "w") as f:
        f.write(TRACE_TAG.format(p=P, s=seed) + "\n")
        if txt:
            f.write("Time [s]\tSignal [mAU]\n")
            for a, b in zip(t, y):
                f.write("%.3f\t%.6f\n" % (a, b))
        else:
            f.write("time_s,signal\n")
            for a, b in zip(t, y):
                f.write("%.3f,%.6f\n" % (a, b))


def fmt_truth(run, row):
    kind, name, t0, mu, h = row
    if kind == "spike":
        return "%s,spike,,%.3f,," % (run, t0)
    return "%s,%s,%s,%.3f,%.2f,%.1f" % (run, kind, name, t0, mu, h)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--seed", type=int, default=1)
    ap.add_argument("--out", required=True)
    ap.add_argument("--profile", choices=list(PROFILES), default="gentle")
    ap.add_argument("--samples", type=int, default=25)
    ap.add_argument("--front-form", choices=["bigauss", "exponential"], default="bigauss",
                    help="form of fronting zones: bi-Gaussian (default) or mirrored exponnorm")
    ap.add_argument("--one-mix", action="store_true",
                    help="one standards mix per method holding the whole panel (near pairs together)")
    a = ap.parse_args()
    P = dict(PROFILES[a.profile], front=a.front_form, one_mix=a.one_mix)
    rng = np.random.default_rng(a.seed)
    out = a.out
    os.makedirs(out + "/samples", exist_ok=True)
    os.makedirs(out + "/standards", exist_ok=True)
    tag = TAG.format(p=a.profile, s=a.seed)
    runs_s, runs_std, mixes, truth, truth_std, hidden = [], [], [], [], [], []
    dT_std = rng.uniform(-1, 1) * P["dTstd"]
    kfile = 0
    for mname, m in METHODS.items():
        panel = m["panel"]
        # mixes: alternate so near pairs land in different mixes
        mix = ({mname + "-all": panel} if P.get("one_mix") else
               {mname + "-mix1": panel[0::2], mname + "-mix2": panel[1::2]})
        for mx, members in mix.items():
            for an, mu in members:
                mixes.append("%s,%s,%d" % (mx, an, round(mu)))
        tm_nom = mig_time(0, m["eof"], m["Lt"], m["Ld"], m["kv"], 0)
        tend = round(tm_nom * 1.35 + 10)
        def one(run, zones_spec, dT, with_window, is_std):
            nonlocal kfile
            kfile += 1
            fs = int(rng.choice(P["fs"])); tau = rng.uniform(*P["tau"])
            ramp = int(rng.choice(P["ramps"]))
            scale = 1 + 0.023 * dT
            eof25 = m["eof"] * (1 + rng.uniform(-1, 1) * P["eof"])
            zones = [(k, n, mu, mu * scale, h) for k, n, mu, h in zones_spec]
            weak = (not is_std) and rng.random() < P["weak"]
            sigma_w = 10 ** rng.uniform(-3, -1.5)
            t, y, tr, bnote = simulate_run(rng, P, m, zones, eof25 * scale, ramp, fs, tau, tend, sigma_w, weak)
            txt = rng.random() < 0.3
            fn = run + (".txt" if txt else ".csv")
            write_trace(out + ("/standards/" if is_std else "/samples/") + fn, t, y, a.profile, a.seed, txt)
            wf, wt = ("%.1f" % (tm_nom * 0.75), "%.1f" % (tm_nom * 1.25)) if with_window else ("", "")
            row = "%s,%g,%g,%g,%d,25,%s,%s,%s,%s" % (fn, m["Lt"], m["Ld"], m["kv"], ramp, mname, wf, wt, m["det"])
            hidden.append("%s,%s,%s,%.2f,%.2f,%.3f,%d,%.3f,%.3g,%d,%s,%s,%s" % (
                run, "standards" if is_std else "samples", mname, 25 + dT, eof25, eof25 * scale, fs, tau,
                sigma_w, ramp, "yes" if weak else "no", "yes" if with_window else "no", bnote))
            return row, [fmt_truth(run, r) for r in sorted(tr, key=lambda r: r[2])]
        for mx, members in mix.items():
            for rep in range(1, 4):
                run = "std-%s-r%d" % (mx, rep)
                spec = [("analyte", an, mu, 10 ** rng.uniform(math.log10(50), math.log10(300))) for an, mu in members]
                row, tr = one(run, spec, dT_std, True, True)
                runs_std.append(row + ",%s,standard %s replicate %d (invented)" % (mx, mx, rep))
                truth_std += tr
        for i in range(1, a.samples + 1):
            run = "%s-smp%02d" % (mname.lower(), i)
            present = [p for p in panel if rng.random() < 0.5]
            if len(present) < 2:
                present = [panel[j] for j in rng.choice(len(panel), 2, replace=False)]
            spec = [("analyte", an, mu, 10 ** rng.uniform(math.log10(P["hmin"]), math.log10(P["hmax"])))
                    for an, mu in present]
            nf = rng.integers(P["foreign"][0], P["foreign"][1] + 1)
            lo = min(abs(mu) for _, mu in panel) - 4; hi = max(abs(mu) for _, mu in panel) + 4
            sgn = 1 if m["eof"] > 0 else -1
            k = 0
            while k < nf:
                mu = sgn * rng.uniform(lo, hi)
                if all(abs(mu - p) / abs(p) >= 0.02 for _, p in panel):
                    k += 1
                    spec.append(("foreign", "foreign-%d" % k, round(mu, 2),
                                 10 ** rng.uniform(math.log10(P["hmin"]), math.log10(P["hmax"]))))
            dT = rng.uniform(-1, 1) * P["dT"]
            win = rng.random() >= P["nomark"]
            row, tr = one(run, spec, dT, win, False)
            runs_s.append(row + ",invented sample %s" % run)
            truth += tr
    hdr = "file,total_length_cm,detector_length_cm,voltage_kv,ramp_s,temperature_c,buffer,marker_from_s,marker_to_s,detection"
    def w(path, header, rows):
        with open(out + "/" + path, "w") as f:
            f.write(tag + "\n" + header + "\n" + "\n".join(rows) + "\n")
    w("samples/runs.csv", hdr + ",sample", runs_s)
    w("standards/runs.csv", hdr + ",mix,sample", runs_std)
    w("standards/mixes.csv", "mix,analyte,approx_mobility", mixes)
    w("truth.csv", "run,kind,analyte,time_s,mobility,height_sd", truth)
    w("standards/truth.csv", "run,kind,analyte,time_s,mobility,height_sd", truth_std)
    w("hidden-conditions.csv", "run,set,buffer,actual_temperature_c,eof_25c,eof_actual,sampling_hz,detector_tau_s,"
      "noise_sd,ramp_s,weak_marker,marker_window_given,baseline_feature", hidden)
    with open(out + "/README.txt", "w") as f:
        f.write(tag + "\nEverything here is invented by .ci/independent-bench.py (profile %s, seed %d); no real sample,"
                " laboratory or instrument.\nPanels (true effective mobilities at 25 C, 1e-9 m^2/(V s), invented):\n" % (a.profile, a.seed))
        for mname, m in METHODS.items():
            f.write("  %s: Lt %d Ld %d %+d kV EOF %g %s: %s\n" % (mname, m["Lt"], m["Ld"], m["kv"], m["eof"], m["det"],
                    ", ".join("%s %g" % p for p in m["panel"])))
        f.write("Profile settings: %r\n" % P)


if __name__ == "__main__":
    main()
