#!/usr/bin/env python3
"""Summarise scan.sh output: for each way of choosing the samples, how many sets come out right by a proxy.

    python3 summarise.py SCAN.txt [SCAN.txt ...] --truth TAG=DIR [--truth TAG=DIR ...]

A set's true k: for a tag given with --truth, the classes of DIR/NAME-truth.csv other than "far-point"
("population" alone means k = 1; nested* cases accept 2 or 4); otherwise from the name as in
bench/judgement/unseen ("...N-" no groups; "S3-" three groups; "nested" any k from 2 up to the planted number).
Proxy for "right": a set without groups has no cut that passes; a set with groups has a cut at a true k, on some
linkage, that passes. The verdict needs the other conditions too, so this is a screen, not the suite.
Rules scored: CUR at 0.05, and CUR at 0.05 together with a local variant at 0.1, 0.2 or 0.3 (a veto).
"""
import collections
import csv
import os
import re
import sys

scans, truth = [], {}
args = sys.argv[1:]
while args:
    a = args.pop(0)
    if a == '--truth':
        tag, d = args.pop(0).split('=', 1)
        truth[tag] = d
    else:
        scans.append(a)

rows = collections.defaultdict(dict)
for fn in scans:
    for line in open(fn):
        f = line.split()
        if len(f) < 3 or '=' not in line:
            continue
        rows[f[0]][f[1]] = {kv.split('=')[0]: float(kv.split('=')[1]) for kv in f[2:]}


def true_k(name):
    tag, n = name.split('/')
    if tag in truth:
        t = os.path.join(truth[tag], n + '-truth.csv')
        if not os.path.exists(t):
            return None
        classes = {r[1] for r in list(csv.reader(open(t)))[1:]} - {'far-point'}
        if classes == {'population'}:
            return {1}
        return {2, 4} if n.startswith('nested') else {len(classes)}
    m = re.match(r'([A-Z]+?)(\d*)-', n)
    if not m:
        return None
    if m.group(1).endswith('N'):
        return {1}
    k = int(m.group(2))
    return set(range(2, k + 1)) if 'nested' in n else {k}


rules = {'CUR': lambda p: p['CUR'] <= 0.05}
for v in ['B25', 'B35', 'B50', 'S50']:
    for level in [0.1, 0.2, 0.3]:
        rules[f'{v}@{level}'] = (lambda v, level: lambda p: p['CUR'] <= 0.05 and p[v] <= level)(v, level)

score, wrong, counted = collections.Counter(), collections.defaultdict(set), 0
for name, cuts in sorted(rows.items()):
    tk = true_k(name)
    if tk is None:
        continue
    counted += 1
    for r, passes in rules.items():
        ks = {int(c.split('-k')[1]) for c, p in cuts.items() if passes(p)}
        right = not ks if tk == {1} else bool(ks & tk)
        score[r] += right
        if not right:
            wrong[r].add(name)
print(f'{counted} sets')
for r in rules:
    print(f"{r:9s} right {score[r]:3d}  newly right: {', '.join(sorted(wrong['CUR'] - wrong[r])) or '-'}"
          f"  newly wrong: {', '.join(sorted(wrong[r] - wrong['CUR'])) or '-'}")
