"""Brute-force dip by linear programming (reference for small n).
dip = inf over unimodal G of sup |F_n - G|; G piecewise linear between sorted data points with a unimodal slope
sequence (mode segment enumerated); constraints |g_i - i/n| <= d and |g_i - (i-1)/n| <= d."""
import numpy as np
from scipy.optimize import linprog

def dip_lp(x):
    x = np.sort(np.asarray(x, float)); n = len(x)
    best = 1.0
    for m in range(n - 1 + 1):  # mode segment index m in 0..n-2 (segment between x_m and x_{m+1}); plus m=-1,n-1 cases covered
        # variables g_0..g_{n-1}, d
        A = []; b = []
        def row(coefs):
            r = np.zeros(n + 1)
            for k, v in coefs: r[k] += v
            return r
        for i in range(n):
            up, lo = (i + 1) / n, i / n
            A.append(row([(i, 1), (n, -1)])); b.append(lo)      # g_i - d <= i/n  (g_i <= lo + d)
            A.append(row([(i, -1), (n, -1)])); b.append(-up)    # -g_i - d <= -(i+1)/n (g_i >= up - d)
        for i in range(n - 1):
            A.append(row([(i, 1), (i + 1, -1)])); b.append(0)   # nondecreasing
        h = np.diff(x)
        for i in range(n - 2):
            # slope s_i = (g_{i+1}-g_i)/h_i ; s_{i+1}
            c1 = [(i + 1, 1 / h[i]), (i, -1 / h[i])]
            c2 = [(i + 2, 1 / h[i + 1]), (i + 1, -1 / h[i + 1])]
            if i + 1 <= m:   # convex: s_i <= s_{i+1}
                A.append(row(c1 + [(k, -v) for k, v in c2])); b.append(0)
            else:            # concave: s_{i+1} <= s_i
                A.append(row(c2 + [(k, -v) for k, v in c1])); b.append(0)
        c = np.zeros(n + 1); c[n] = 1
        bounds = [(0, 1)] * n + [(0, 1)]
        r = linprog(c, A_ub=np.array(A), b_ub=np.array(b), bounds=bounds, method="highs")
        if r.status == 0: best = min(best, r.x[n])
    return best
