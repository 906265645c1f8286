#!/usr/bin/env python3
"""A short generic script, the yardstick the tool is compared with: generic peak finding (scipy),
the neutral marker as the tallest peak in its window, fixed windows of +-w units around the library
mobilities. Needs numpy and scipy; not run by CI.
usage: python3 .ci/generic-script.py BENCH_DIR OUT.csv [--w 1.0] [--k 4] [--ramp]"""
import argparse, csv, os
import numpy as np
from scipy.ndimage import median_filter, gaussian_filter1d
from scipy.signal import find_peaks

def rows(path):  # CSV rows without '#' comment lines
    with open(path, newline='', encoding='utf-8') as f:
        return list(csv.DictReader(l for l in f if not l.startswith('#')))

def read_trace(path):
    lines = [l.strip() for l in open(path, encoding='utf-8') if l.strip() and not l.startswith('#')]
    head, body = lines[0], lines[1:]
    if ';' in head:                       # 'Time (min);Signal', decimal comma
        a = np.array([[float(x.replace(',', '.')) for x in l.split(';')] for l in body])
        a[:, 0] *= 60.0
    else:
        sep = '\t' if '\t' in head else ','
        a = np.array([[float(x) for x in l.split(sep)] for l in body])
    return a[:, 0], a[:, 1]

def detect(t, y, indirect, k):
    dt = np.median(np.diff(t))
    if indirect:
        y = -y
    y = median_filter(y, size=5, mode='nearest')                # despike (1-2 point spikes)
    y = gaussian_filter1d(y, max(0.25 / dt, 0.5))             # light smoothing, 0.25 s
    base = median_filter(y, size=int(60 / dt) | 1, mode='nearest')  # 60 s rolling median
    s = y - base
    noise = 1.4826 * np.median(np.abs(s - np.median(s)))
    idx, p = find_peaks(s, prominence=k * noise, width=0.8 / dt, rel_height=0.5)
    out = []
    for i, l, r, h in zip(idx, p['left_ips'], p['right_ips'], p['prominences']):
        lo, hi = int(np.floor(l)), int(np.ceil(r)) + 1          # centroid over the half-height part
        w = np.clip(s[lo:hi], 0, None)
        c = float(np.sum(t[lo:hi] * w) / np.sum(w)) if w.sum() > 0 else t[i]
        out.append(dict(apex=t[i], centre=c, height=h, whalf=(r - l) * dt))
    return out

def main():
    ap = argparse.ArgumentParser()
    ap.add_argument('bench'); ap.add_argument('out')
    ap.add_argument('--w', type=float, default=1.0); ap.add_argument('--k', type=float, default=4.0)
    ap.add_argument('--ramp', action='store_true', help='correct times for a linear voltage ramp (t - ramp/2)')
    a = ap.parse_args()
    runs = rows(os.path.join(a.bench, 'samples', 'runs.csv'))
    lib = rows(os.path.join(a.bench, 'library.csv'))
    # no marker window in the sheet: use the median window of the same method's other runs
    win = {}
    for r in runs:
        if r['marker_from_s'] and r['marker_to_s']:
            win.setdefault(r['buffer'], []).append((float(r['marker_from_s']), float(r['marker_to_s'])))
    win = {b: tuple(np.median(np.array(v), axis=0)) for b, v in win.items()}
    out = []
    for r in runs:
        name = os.path.splitext(r['file'])[0]
        t, y = read_trace(os.path.join(a.bench, 'samples', r['file']))
        peaks = detect(t, y, r['detection'].strip().lower() == 'indirect', a.k)
        lo, hi = ((float(r['marker_from_s']), float(r['marker_to_s'])) if r['marker_from_s']
                  else win.get(r['buffer'], (np.nan, np.nan)))
        inwin = [p for p in peaks if lo <= p['apex'] <= hi]
        marker = max(inwin, key=lambda p: p['height']) if inwin else None
        if marker is None:
            out.append(dict(run=name, peak='', role='', status='no_peaks'))  # no scale: nothing called
            continue
        Lt, Ld, V = float(r['total_length_cm']), float(r['detector_length_cm']), float(r['voltage_kv']) * 1000
        off = float(r['ramp_s'] or 0) / 2 if a.ramp else 0.0
        teof = marker['centre'] - off
        for p in peaks:
            p['mu'] = 0.0 if p is marker else Ld * Lt / V * (1 / (p['centre'] - off) - 1 / teof) * 1e5
            p['name'] = None
        # greedy one-to-one matching of library entries to peaks within +-w
        cand = sorted((abs(p['mu'] - float(e['mobility'])), i, e['name'])
                      for e in lib if e.get('buffer', r['buffer']) == r['buffer']
                      for i, p in enumerate(peaks) if p is not marker and abs(p['mu'] - float(e['mobility'])) <= a.w)
        used_e, used_p = set(), set()
        for d, i, n in cand:
            if i not in used_p and n not in used_e:
                peaks[i]['name'] = n; used_p.add(i); used_e.add(n)
        for j, p in enumerate(peaks, 1):
            m = p is marker
            out.append(dict(run=name, sample=r.get('sample', ''), peak=j, role='neutral marker' if m else 'analyte',
                            apex_time_s='%.4f' % p['apex'], centre_time_s='%.4f' % p['centre'],
                            width_half_s='%.4f' % p['whalf'], mobility='%.3f' % p['mu'],
                            mobility_sd='', mobility_at_library_temp='%.3f' % p['mu'], assigned=p['name'] or '',
                            confidence='' if m else '1.0',
                            status='marker' if m else ('identified' if p['name'] else 'unassigned')))
    cols = ['run', 'sample', 'peak', 'role', 'apex_time_s', 'centre_time_s', 'width_half_s', 'mobility',
            'mobility_sd', 'mobility_at_library_temp', 'assigned', 'confidence', 'status']
    with open(a.out, 'w', newline='') as f:
        wr = csv.DictWriter(f, cols, restval=''); wr.writeheader(); wr.writerows(out)

if __name__ == '__main__':
    main()
