#!/usr/bin/env python3
# Tried in the tenth session (4 December 2026); see bench/judgement/README.md, "Rechecked end to end".
"""Re-decides stored studies (summary.json) with the separation p-values of a trial variant.

Usage: resep.py VARIANT 'TRIAL_TSV_GLOB' OUT_DIR...   VARIANT: cur (reproduces main), sym10, sym20, symloc20, half,
halfq, third (TrialSeparation.log's columns in that order). Each cut's verdict is recomputed from its recorded
conditions with the variant's p-value for the separation condition, then the recommendation is re-decided as on main
(redecide.py's rule).
"""
import json, os, sys, glob
sys.path.insert(0, os.path.join(os.path.dirname(os.path.abspath(__file__)), '..', '..', 'between-linkages'))
import redecide as R

ALPHA = 0.05
NAMES = ['cur', 'sym10', 'sym20', 'symloc20', 'half', 'halfq', 'third']

def load_trial(files):
    t = {}
    for f in files:
        for line in open(f):
            parts = line.rstrip('\n').split('\t')
            cmd = parts[0].split()
            out = os.path.realpath(cmd[cmd.index('--out') + 1]) if '--out' in cmd else None
            t[(out, parts[1].lower(), int(parts[2]))] = [float(x) for x in parts[3:]]
    return t

def verdict(b, p):
    met, failed = set(b['conditionsMet']), set(b['conditionsFailed'])
    if 'every-cluster-separated' not in met | failed or p != p:
        return b['verdict']
    sep = p <= ALPHA + 1e-12
    if 'beats-null' in met | failed:
        block = failed - {'every-cluster-separated', 'every-cluster-stable'}
        if block or not sep:
            return 'unsupported'
        return 'tentative' if 'every-cluster-stable' in failed else 'supported'
    block = failed - {'every-cluster-separated'}
    return 'unsupported' if block or not sep else 'tentative'

def main():
    var = sys.argv[1]
    col = NAMES.index(var)
    trial = load_trial(glob.glob(sys.argv[2]))
    for out in sys.argv[3:]:
        f = os.path.join(out, 'summary.json')
        if not os.path.exists(f):
            continue
        d = json.load(open(f))
        key = os.path.realpath(out)
        ss = R.sols(d)
        base = R.decide(ss, R.recorded)
        byk = {(l['linkage'], b['k']): b for l in d['linkages'] for b in l['byK']}
        missing = 0
        for s in ss:
            tp = trial.get((key, s['l'], s['k']))
            if tp is None or len(tp) <= col:
                missing += 1
                continue
            s['v'] = verdict(byk[(s['l'], s['k'])], tp[col])
        v = R.decide(ss, R.recorded)
        r = d['recommendation']
        rec = (r['linkage'] if r['verdict'] != 'unsupported' else '-', r['k'], r['verdict'])
        flag = '' if base == rec else '  BASE-MISMATCH'
        ch = '' if v == base else '  CHANGED'
        miss = f'  MISSING{missing}' if missing else ''
        print(f"{os.path.basename(out.rstrip('/')):30s} base={base} {var}={v}{flag}{ch}{miss}")

main()
