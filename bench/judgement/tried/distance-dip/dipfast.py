"""Hartigan's dip statistic (J. A. Hartigan and P. M. Hartigan, "The dip test of unimodality", Ann. Statist. 13
(1985) 70-84, doi:10.1214/aos/1176346577): the distance from the empirical distribution function to the nearest
unimodal one, found by alternating the greatest convex minorant and the least concave majorant over a shrinking
modal interval. Written for the prototype in proto.py; check.py compares it with diplp.py (the definition solved as
linear programmes by scipy) on 150 small random samples."""
import numpy as np

def _lower_hull(xs, ys):
    """indices of the greatest convex minorant vertices of points (xs, ys), xs increasing"""
    h = []
    for i in range(len(xs)):
        while len(h) >= 2:
            a, b = h[-2], h[-1]
            # remove b if it lies on or above segment a->i
            if (ys[b] - ys[a]) * (xs[i] - xs[a]) >= (ys[i] - ys[a]) * (xs[b] - xs[a]):
                h.pop()
            else:
                break
        h.append(i)
    return h

def _upper_hull(xs, ys):
    h = []
    for i in range(len(xs)):
        while len(h) >= 2:
            a, b = h[-2], h[-1]
            if (ys[b] - ys[a]) * (xs[i] - xs[a]) <= (ys[i] - ys[a]) * (xs[b] - xs[a]):
                h.pop()
            else:
                break
        h.append(i)
    return h

def _interp(xs, ys, verts, q):
    return np.interp(q, xs[verts], ys[verts])

def dip(x):
    x = np.sort(np.asarray(x, float)); n = len(x)
    if n < 2 or x[0] == x[-1]:
        return 0.0
    lower = np.arange(n, dtype=float)      # ECDF just before x_i, in counts
    upper = lower + 1.0                    # ECDF at x_i
    lo, hi = 0, n - 1
    D = 0.0
    while True:
        idx = np.arange(lo, hi + 1)
        xs = x[idx]
        g = [idx[v] for v in _lower_hull(xs, lower[idx])]
        l = [idx[v] for v in _upper_hull(xs, upper[idx])]
        g = np.array(g); l = np.array(l)
        dg = np.interp(x[g], x[l], upper[l]) - lower[g]     # LCM above GCM vertices
        dl = upper[l] - np.interp(x[l], x[g], lower[g])     # LCM vertices above GCM
        if dg.max() >= dl.max():
            d = dg.max(); t = g[np.argmax(dg)]
            lo2, hi2 = t, l[l >= t][0]
        else:
            d = dl.max(); t = l[np.argmax(dl)]
            hi2, lo2 = t, g[g <= t][-1]
        if d <= D:
            break
        li = np.arange(lo, lo2 + 1)
        left = (upper[li] - np.interp(x[li], x[g], lower[g])).max() if len(li) else 0
        ri = np.arange(hi2, hi + 1)
        right = (np.interp(x[ri], x[l], upper[l]) - lower[ri]).max() if len(ri) else 0
        D = max(D, left, right)
        if (lo2, hi2) == (lo, hi):
            D = max(D, d); break
        lo, hi = lo2, hi2
    return D / (2 * n)
