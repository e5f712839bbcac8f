#!/usr/bin/env python3
"""Re-decides a study's recommendation from its summary.json under another ordering of the solutions.

The verdicts stay those in the file; only the choice among them changes. The rule as main has it since the ninth
session (DecisionRule item 3, Recommender.recommendedLinkage): solutions are ordered by verdict, then a strength
(the excess over the null), the smallest Jaccard and the cophenetic correlation; each linkage's best solution
(passing states left out) is its first in that order; the first of these gives the verdict; when it is supported,
the finest supported level over every linkage is recommended (ties: the linkage whose best comes first), otherwise
that first solution.

"base" is that rule with the excess recorded in the file, and must reproduce the recorded recommendation
("BASE-MISMATCH" when it does not: then this mirror of the rule is out of date). A variant is STRENGTH or
STRENGTH/CHOICE:

  STRENGTH (recomputed from the recorded means and SDs)
    z          the recorded excess
    aridiff    mean ARI minus the null's mean ARI, not standardised
    zfloorNN   the ARI's difference over the null's SD raised to 0.NN (plus the silhouette term)
    pooled     ... over the root-sum-square of the null's SD and the replicates' SD
    welchR     ... over sqrt(sd_null^2 + sd_obs^2 / replicates), the SE of the observed mean
    welchset   ... over sqrt(sd_null^2 + sd_obs^2 / replicatesPerSet); what main records since the ninth session
    zold       ... over sd_null alone, the excess before the ninth session
  CHOICE
    finest     the finest supported level over every linkage (main since the ninth session; the default)
    order      the linkage whose best solution comes first, and that linkage's finest level (before)

Usage: redecide.py VARIANT OUT_DIR...   one line per study: the recorded recommendation, "base" and the variant
(linkage, k, verdict), marked CHANGED where the variant differs from base.
Example: redecide.py zold/order OUT...  re-decides with the rule before the ninth session.
"""
import json
import math
import os
import sys

ORD = {"supported": 0, "tentative": 1, "unsupported": 2}
SD_FLOOR = 1e-3


def nz(v):
    return -math.inf if v is None or (isinstance(v, float) and math.isnan(v)) else v


def sols(d):
    out = []
    for li, l in enumerate(d["linkages"]):
        for b in l["byK"]:
            st = b["stability"]
            nu = st.get("null") or {}
            jac = [0 if c.get("jaccard") is None else c["jaccard"] for c in b["clusters"]]
            out.append(dict(l=l["linkage"], li=li, k=b["k"], v=b["verdict"], excess=nu.get("excess"),
                            ari=st.get("ariMean"), asd=st.get("ariSD"), R=st.get("replicates"),
                            m=nu.get("replicatesPerSet"), nam=nu.get("ariMean"), nasd=nu.get("ariSD"),
                            sil=b.get("silhouette"), nsm=nu.get("silhouetteMean"), nssd=nu.get("silhouetteSD"),
                            worst=min(jac) if jac else 1, coph=l["copheneticCorrelation"], cut=b["cutHeight"]))
    return out


def persistence(s):
    lo, hi = s["cut"]["low"], s["cut"]["high"]
    if hi is None or lo is None:
        return 0
    return (hi - lo) / hi if hi > lo and hi > 0 and math.isfinite(hi) else 0


def passing(own):
    widest = max([persistence(s) for s in own if s["v"] == "supported"], default=0)
    if widest <= 0:
        return set()
    return {s["k"] for s in own if s["v"] == "supported" and persistence(s) < 0.5 * widest}


def decide(ss, strength, choice="finest"):
    key = lambda s: (ORD[s["v"]], -nz(strength(s)), -nz(s["worst"]), -nz(s["coph"]))
    per = {}
    for li in sorted({s["li"] for s in ss}):
        own = [s for s in ss if s["li"] == li]
        p = passing(own)
        cand = [s for s in own if s["k"] not in p]
        if not cand:
            continue
        best = min(cand, key=key)  # min is stable: the earlier k on ties
        if best["v"] == "unsupported":
            continue
        if best["v"] == "supported":
            lv = [s["k"] for s in own if (s["v"] == "supported" and s["k"] not in p) or s["k"] == best["k"]]
            per[li] = (best, next(s for s in own if s["k"] == max(lv)))
        else:
            per[li] = (best, best)
    if not per:
        return ("-", 1, "unsupported")
    wl = min(per, key=lambda li: key(per[li][0]))
    if choice == "finest" and per[wl][0]["v"] == "supported":
        sup = [li for li in per if per[li][0]["v"] == "supported"]
        top = max(per[li][1]["k"] for li in sup)
        wl = min((li for li in sup if per[li][1]["k"] == top), key=lambda li: key(per[li][0]))
    w = per[wl][1]
    return (w["l"], w["k"], w["v"])


def recorded(s):
    return s["excess"]


def silterm(s):
    return (s["sil"] - s["nsm"]) / max(SD_FLOOR, s["nssd"])


def standardised(scale):
    def g(s):
        if s["nam"] is None:
            return None
        return (s["ari"] - s["nam"]) / max(SD_FLOOR, scale(s)) + silterm(s)
    return g


def aridiff(s):
    return None if s["nam"] is None else s["ari"] - s["nam"]


def strength(name):
    if name == "z":
        return recorded
    if name == "aridiff":
        return aridiff
    if name.startswith("zfloor"):
        f = int(name[len("zfloor"):]) / 100
        return standardised(lambda s: max(f, s["nasd"]))
    return standardised({
        "zold": lambda s: s["nasd"],
        "pooled": lambda s: math.hypot(s["nasd"], s["asd"] or 0),
        "welchR": lambda s: math.sqrt(s["nasd"] ** 2 + (s["asd"] or 0) ** 2 / s["R"]),
        "welchset": lambda s: math.sqrt(s["nasd"] ** 2 + (s["asd"] or 0) ** 2 / s["m"]),
    }[name])


def main():
    var = sys.argv[1]
    name, _, choice = var.partition("/")
    st = strength(name)
    for out in sys.argv[2:]:
        f = os.path.join(out, "summary.json")
        if not os.path.exists(f):
            continue
        d = json.load(open(f))
        r = d["recommendation"]
        ss = sols(d)
        b = decide(ss, recorded)
        v = decide(ss, st, choice or "finest")
        rec = (r["linkage"] if r["verdict"] != "unsupported" else "-", r["k"], r["verdict"])
        flag = "" if b == rec else "  BASE-MISMATCH"
        ch = "" if v == b else "  CHANGED"
        print(f"{os.path.basename(out):30s} rec={rec} base={b} {var}={v}{flag}{ch}")


if __name__ == "__main__":
    main()
