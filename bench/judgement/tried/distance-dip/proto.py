"""Prototype: does each merge above a cut join two modes? Dip test (Hartigan & Hartigan 1985) on distances from
viewers (Kalogeratos & Likas 2012), balanced or not."""
import numpy as np, sys, os, json, functools
sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from dipfast import dip
from scipy.cluster.hierarchy import linkage, fcluster
from scipy.spatial.distance import pdist, squareform

GRID = [8, 12, 16, 24, 32, 48, 64, 96, 128, 192, 256, 384, 512, 1024]
QS = [0.95, 0.99, 0.999]
def table():
    f = os.path.join(os.path.dirname(os.path.abspath(__file__)), 'unif_table.npy')
    if os.path.exists(f): return np.load(f)
    rng = np.random.default_rng(11)
    t = np.zeros((len(GRID), len(QS)))
    for i, m in enumerate(GRID):
        reps = 2000 if m <= 256 else 600
        d = np.array([dip(rng.uniform(size=m)) for _ in range(reps)])
        t[i] = np.quantile(d, QS) * np.sqrt(m)
        print('table', m, t[i], file=sys.stderr)
    np.save(f, t); return t
T = table()
def crit(m, qi):
    return np.interp(np.log(m), np.log(GRID), T[:, qi]) / np.sqrt(m)

def split_fraction(D, members, rng, qi, max_viewers=120):
    members = np.asarray(members)
    m = len(members)
    viewers = members if m <= max_viewers else rng.choice(members, max_viewers, replace=False)
    c = crit(m - 1, qi)
    sig = 0
    for v in viewers:
        d = D[v, members]; d = d[members != v]
        if dip(d) > c: sig += 1
    return sig / len(viewers)

def load(path):
    import csv
    rows = list(csv.reader(open(path)))
    X = np.array([[float(v) for v in r[1:]] for r in rows[1:]])
    return X

def study(path, ks=range(2, 8), links=('ward', 'average', 'complete'), balanced=True, qi=1, samples_in_columns=False, log2=False):
    X = load(path)
    if samples_in_columns: X = X.T
    if log2: X = np.log2(X + 1)
    sd = X.std(axis=0, ddof=1); X = (X - X.mean(0)) / np.where(sd > 0, sd, 1)
    n = len(X)
    D = squareform(pdist(X))
    out = {}
    rng = np.random.default_rng(5)
    for link in links:
        Z = linkage(X, link)
        members = {i: [i] for i in range(n)}
        for r in range(n - 1):
            a, b = int(Z[r, 0]), int(Z[r, 1])
            members[n + r] = members[a] + members[b]
        merge_frac = {}
        for k in ks:
            # merges above the cut at k: the last k-1 rows
            fr = []
            for r in range(n - k, n - 1):
                if r not in merge_frac:
                    A, B = members[int(Z[r, 0])], members[int(Z[r, 1])]
                    if min(len(A), len(B)) < 5:
                        merge_frac[r] = None
                    else:
                        if balanced and len(A) != len(B):
                            small, big = (A, B) if len(A) < len(B) else (B, A)
                            big = list(rng.choice(big, len(small), replace=False)) if len(big) > len(small) else big
                            U = small + big
                        else:
                            U = A + B
                        merge_frac[r] = (split_fraction(D, U, rng, qi), len(A), len(B))
                fr.append(merge_frac[r])
            labels = fcluster(Z, k, 'maxclust')
            sizes = sorted(np.bincount(labels)[1:], reverse=True)
            real = [f for f in fr if f is not None]
            out[(link, k)] = (min(f[0] for f in real) if real else None, sizes, [None if f is None else (round(f[0], 2), f[1], f[2]) for f in fr])
    return out

if __name__ == '__main__':
    path = sys.argv[1]
    bal = os.environ.get('BAL', '1') == '1'
    kw = {}
    if 'counts' in path: kw = dict(samples_in_columns=True, log2=True)
    res = study(path, balanced=bal, **kw)
    name = os.path.basename(path)
    for (link, k), (mn, sizes, fr) in res.items():
        print(f"{name:30s} {link:9s} k={k} min={mn} sizes={sizes[:8]} merges={fr}")
