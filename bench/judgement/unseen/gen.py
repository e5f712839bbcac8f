"""Seeded data sets that the decision rule was not developed on (bench/judgement/unseen/README.md).

Usage: python3 gen.py OUTDIR   (numpy only; seed 20261202, then five from 20261203, twenty-two from 20261204, twenty from 20261205 fifteen from 20261206 and fourteen from 20261207; writes OUTDIR/<name>.csv,
samples in rows)
"""
import os
import sys

import numpy as np

OUT = sys.argv[1] if len(sys.argv) > 1 else "."
os.makedirs(OUT, exist_ok=True)


def save(name,X,truth=None,opts=None):
    """Writes OUTDIR/name.csv (samples in rows); with truth, name.truth (one planted label per sample, -1 for a
    planted far sample); with opts, name.opts (options run.sh adds, e.g. --log2)."""
    n,p=X.shape
    with open(os.path.join(OUT, name + ".csv"), "w") as f:
        f.write("id,"+",".join(f"f{j+1:03d}" for j in range(p))+"\n")
        for i in range(n): f.write(f"s{i+1:04d},"+",".join(f"{v:.5f}" for v in X[i])+"\n")
    save_extras(name,truth,opts)


def save_extras(name,truth,opts):
    if truth is not None:
        with open(os.path.join(OUT, name + ".truth"), "w") as f:
            f.write("".join(f"{int(t)}\n" for t in truth))
    if opts:
        with open(os.path.join(OUT, name + ".opts"), "w") as f:
            f.write(opts + "\n")
r=np.random.default_rng(20261202)
# 1 two groups with t3 within noise
X=r.standard_t(3,(200,8)); X[:100,:3]+=6; save("t3-two-groups",X)
# 2 wide gaussian noise
save("wide-noise-p200",r.standard_normal((100,200)))
# 3 wide heavy-tailed noise
save("wide-t3-noise-p50",r.standard_t(3,(150,50)))
# 4 unequal variances 3 groups
X=np.vstack([r.standard_normal((80,6))*3, r.standard_normal((50,6))*0.7+[8,0,0,0,0,0], r.standard_normal((50,6))*0.7+[0,8,0,0,0,0]]); save("unequal-spread-3",X)
# 6 moderate overlap 2 groups
X=r.standard_normal((160,5)); X[:80,0]+=3.5; save("overlap-2-groups",X)
# 7 uniform 10D
save("uniform-10d",r.uniform(size=(150,10)))
# 8 gaussian + 5% scattered far outliers
X=r.standard_normal((190,6)); O=r.standard_normal((10,6)); O=O/np.linalg.norm(O,axis=1)[:,None]*r.uniform(8,14,(10,1)); save("gauss-5pct-outliers",np.vstack([X,O]))
# 9 log-normal skewed noise
save("lognormal-noise",np.exp(r.standard_normal((180,8))))
# 10 likert noise
save("likert-noise",r.integers(1,6,(200,15)).astype(float))
# 11 likert 3 types
P=np.array([[0.05,0.1,0.2,0.3,0.35],[0.35,0.3,0.2,0.1,0.05],[0.1,0.2,0.4,0.2,0.1]])
types=np.repeat([0,1,2],[70,70,60]); X=np.zeros((200,15))
for i,t in enumerate(types):
    for j in range(15):
        pr=P[t] if j<10 else P[2]
        X[i,j]=r.choice(5,p=pr)+1
save("likert-3-types",X)
# 12 gaussian noise n=400 p=3 (larger n)
save("gauss-n400-p3",r.standard_normal((400,3)))
# 13 microbial-ish: dirichlet compositions no groups
save("dirichlet-noise",r.dirichlet(np.ones(10)*2,200))
# 14 mixture 2 groups one tiny (8 of 300) close-ish
X=r.standard_normal((300,5)); X[:8]+= [6,6,0,0,0]; save("tiny-group-8of300",X)
# 15 batch: one population, two batches shifted by 1 sd in all 20 features
X=r.standard_normal((160,20)); X[:80]+=0.8; save("batch-shift",X)
# --- added 2 Dec 2026 after the Qn null, from their own generator so the sets above are unchanged ---
q=np.random.default_rng(20261203)
# 16 zero-inflated abundances (40% zeros, log-normal otherwise), independent features, no groups
save("zero-inflated-noise",np.exp(q.normal(2,1,(200,20)))*(q.random((200,20))>0.4))
# 17 sparser: 60% zeros, 30 features, no groups
save("zero-inflated-sparse",np.exp(q.normal(1,1,(250,30)))*(q.random((250,30))>0.6))
# 18 factor model: 3 latent factors over 30 features plus noise, no groups (strongly elongated)
F=q.normal(size=(220,3)); L=q.normal(size=(3,30)); save("factor-model-noise",F@L+0.5*q.normal(size=(220,30)))
# 19 integer scores: Gaussian SD 1.2 rounded, 12 features, no groups (many tied values)
save("rounded-gaussian",np.round(q.normal(0,1.2,(180,12))))
# 20 two groups in zero-inflated data: the second 100 have 6x the abundance on 8 of 20 features
X=np.exp(q.normal(2,1,(200,20)))*(q.random((200,20))>0.4); X[100:,:8]*=6; save("zero-inflated-2-groups",X)
# --- added 2 Dec 2026 (evening), own generator: variations of the hard kinds at other sizes. Names say the answer:
# N- none, S<k>- k planted groups, W<k>- k weakly separated groups (k or none). S5-5groups-p10 showed the
# coarser-k preference that the finest-level choice fixed, so these are not all unseen by that change.
w=np.random.default_rng(20261204)
save("N-gauss-n60-p4", w.standard_normal((60,4)))
A=np.linalg.cholesky(0.8**np.abs(np.subtract.outer(np.arange(30),np.arange(30))))
save("N-ar1-n300-p30", w.standard_normal((300,30))@A.T)
save("N-t2-n200-p6", w.standard_t(2,(200,6)))
save("N-t5-n250-p20", w.standard_t(5,(250,20)))
save("N-wide-n80-p2000", w.standard_normal((80,2000)))
save("N-exp-n200-p10", w.exponential(size=(200,10)))
save("N-poisson-n200-p20", w.poisson(2,(200,20)).astype(float))
save("N-binary-n200-p30", (w.random((200,30))<0.4).astype(float))
X=w.standard_normal((220,5)); X[:3]+=12; save("N-gauss-3clumped-far", X)
save("N-gauss-n1000-p8", w.standard_normal((1000,8)))
X=w.standard_normal((120,1000)); X[:60,:30]+=2.0; save("S2-wide-n120-p1000", X)
C=w.standard_normal((5,10)); C=C/np.linalg.norm(C,axis=1)[:,None]*5
save("S5-5groups-p10", np.vstack([w.standard_normal((40,10))+c for c in C]))
X=w.standard_t(3,(300,6)); X[:30,:2]+=8; save("S2-imbal-270-30-t3", X)
X=w.standard_normal((200,6)); X[:100,0]+=10; X[:50,1]+=5; X[100:150,2]+=5; save("S4-nested-2x2", X)
X=w.standard_normal((100,50)); X[:50]+=1.2; save("S2-batch-p50", X)
C=np.array([[0,0,0,0],[7,0,0,0],[0,7,0,0]])
X=np.vstack([w.standard_normal((60,4))+c for c in C]); O=w.standard_normal((10,4))
O=O/np.linalg.norm(O,axis=1)[:,None]*w.uniform(15,25,(10,1)); save("S3-3groups-10out", np.vstack([X,O]))
X=w.standard_normal((400,10)); X[:12,:3]+=5; save("S2-small-12of400", X)
P=np.array([[0.8]*10+[0.2]*10+[0.5]*10,[0.2]*10+[0.8]*10+[0.5]*10,[0.5]*10+[0.2]*10+[0.8]*10,[0.2]*10+[0.5]*10+[0.2]*10])
save("S4-binary-4types", np.vstack([(w.random((50,30))<P[g]).astype(float) for g in range(4)]))
X=w.standard_t(2,(200,5)); X[:100,:3]+=10; save("S2-t2-two-groups", X)
save("W3-close-4sd", np.vstack([w.standard_normal((50,3))+c for c in np.array([[0,0,0],[4,0,0],[2,3.46,0]])]))
C=w.standard_normal((6,50)); C=C/np.linalg.norm(C,axis=1)[:,None]*6
save("S6-6groups-p50", np.vstack([w.standard_normal((25,50))+c for c in C]))
X=np.exp(w.normal(0,1,(150,15))); X[:75,:5]*=8; save("S2-lognormal-groups", X)
# --- added 2-3 Dec 2026 (around midnight), own generator: a fresh batch made before looking at any verdict, with the
# planted labels (name.truth) so run.sh prints the ARI of the recommendation with them. Prefix V: N none, S<k> k groups.
v=np.random.default_rng(20261205)
def blobs(sizes, centres, noise=lambda m,p: v.standard_normal((m,p))):
    X=np.vstack([noise(m,len(c))+c for m,c in zip(sizes,centres)]); return X, np.repeat(np.arange(len(sizes)),sizes)
save("VN-gauss-n500-p2", v.standard_normal((500,2)))
save("VN-t3-n300-p15", v.standard_t(3,(300,15)))
save("VN-uniform-n300-p3", v.uniform(size=(300,3)))
save("VN-mixed-scales-p12", v.standard_normal((200,12))*np.logspace(-2,2,12))
X=v.standard_normal((250,6)); X[0]=15*X[0]/np.linalg.norm(X[0]); save("VN-gauss-1far", X)
save("VN-lognormal-log2", np.exp(v.normal(3,1,(200,10))), opts="--log2")
def save_rows(name, G, truth=None):
    """Counts with one feature (gene) per row and one sample per column, read with --samples-in-columns --log2."""
    with open(os.path.join(OUT, name + ".csv"), "w") as f:
        f.write("gene,"+",".join(f"s{i+1:03d}" for i in range(G.shape[1]))+"\n")
        for j in range(G.shape[0]): f.write(f"g{j+1:04d},"+",".join(str(int(x)) for x in G[j])+"\n")
    save_extras(name,truth,"--samples-in-columns --log2")
save_rows("VN-nbcounts-rows", v.negative_binomial(5,5/(5+np.exp(v.normal(3,1.5,(400,1)))),(400,60)))
mu=np.exp(v.normal(3,1.5,(400,1)))*np.ones((400,60)); t=np.repeat([0,1,2],20)
for g in range(3): mu[g*40:(g+1)*40, t==g]*=4
save_rows("VS3-nbcounts-rows", v.negative_binomial(5,5/(5+mu)), truth=t)
X=v.standard_normal((290,8)); X[:10,:3]+=6; save("VS2-small-10of290", X, truth=(np.arange(290)>=10).astype(int))
R=np.diag([3,0.5,0.5,0.5,0.5]); X,t=blobs([70,70,70],[[0,0,0,0,0],[0,5,0,0,0],[0,0,5,0,0]],lambda m,p: v.standard_normal((m,p))@R)
save("VS3-elongated", X, truth=t)
C=v.standard_normal((4,8)); C=C/np.linalg.norm(C,axis=1)[:,None]*6; X,t=blobs([200,100,50,25],C); save("VS4-sizes-200-100-50-25", X, truth=t)
X=v.standard_normal((150,500)); t=np.repeat([0,1,2],50); X[t==1,:25]+=1.5; X[t==2,25:50]+=1.5; save("VS3-wide-n150-p500", X, truth=t)
X,t=blobs([100,100],[[7,7,0,0,0,0],[0,0,0,0,0,0]]); O=v.standard_normal((5,6)); O=O/np.linalg.norm(O,axis=1)[:,None]*20
save("VS2-groups-5far", np.vstack([X,O]), truth=np.concatenate([t,-np.ones(5)]))
X,t=blobs([100,60,60],[[12,0,0,0],[0,0,0,0],[0,5,0,0]]); save("VS3-nested-family", X, truth=t)
X,t=blobs([80,80,80],[[8,0,0,0,0,0],[0,8,0,0,0,0],[0,0,0,0,0,0]],lambda m,p: v.standard_t(4,(m,p))); save("VS3-t4-groups", X, truth=t)
C=v.standard_normal((8,20)); C=C/np.linalg.norm(C,axis=1)[:,None]*6; X,t=blobs([30]*8,C); save("VS8-8groups-p20", X, truth=t)
X,t=blobs([60,60,60],[[6,0]+[0]*8,[0,6]+[0]*8,[0]*10]); X[::2]+=1.0; save("VS3-groups-plus-batch", X, truth=t)
P=np.array([[0.75]*20+[0.5]*20,[0.25]*20+[0.5]*20]); t=np.repeat([0,1],[90,90])
save("VS2-binary-2types", (v.random((180,40))<P[t]).astype(float), truth=t)
X,t=blobs([50]*4,[[0,0],[6,0],[0,6],[6,6]]); save("VS4-square-p2", X, truth=t)
X=v.standard_normal((300,3)); X=5*X/np.linalg.norm(X,axis=1)[:,None]+0.3*v.standard_normal((300,3)); save("VN-sphere-shell", X)
# --- added 3 Dec 2026 (morning), fifth generator, written and run once before any of its verdicts was seen. Prefix U:
# UN none, US<k> k groups. Kinds: continua (a linear gradient, an arc), technical triplicates, small n, correlated
# heavy tails, sparse counts with uneven library sizes, one latent trait on a 1-5 scale; small groups of 10, nested
# groups in wide data, groups in t3 noise beside far samples, survey types, compositions, counts in rows with five
# subtypes, unequal covariances, groups on a few features of mixed units.
u=np.random.default_rng(20261206)
def ublobs(sizes, centres, noise=lambda m,p: u.standard_normal((m,p))):
    return blobs(sizes, centres, noise)   # blobs of the fourth generator, drawing from this generator's seed
t=u.uniform(0,1,(240,1)); a=u.standard_normal((1,12)); a=a/np.linalg.norm(a)*6
save("UN-gradient-linear", t@a+u.standard_normal((240,12)))
th=u.uniform(0,np.pi,220); X=np.column_stack([10*np.cos(th),10*np.sin(th)])+u.standard_normal((220,2))
save("UN-gradient-arc-p10", np.hstack([X,u.standard_normal((220,8))]))
B=u.standard_normal((60,8)); save("UN-tech-triplicates", np.repeat(B,3,axis=0)+0.15*u.standard_normal((180,8)))
save("UN-small-n30-p5", u.standard_normal((30,5)))
S=0.7**np.abs(np.subtract.outer(np.arange(20),np.arange(20))); L=np.linalg.cholesky(S)
save("UN-t3-correlated-p20", (u.standard_normal((250,20))@L.T)/np.sqrt(u.chisquare(3,(250,1))/3))
sf=np.exp(u.normal(0,0.5,(1,80))); mu=np.exp(u.normal(0,1.2,(300,1)))*sf
save_rows("UN-sparse-counts-rows", u.negative_binomial(2,2/(2+mu)))
z=u.standard_normal((200,1)); ld=u.uniform(0.5,1.2,(1,20))
save("UN-likert-one-trait", np.clip(np.round(3+z@ld+0.8*u.standard_normal((200,20))),1,5))
X,t=ublobs([10,10,10],[[8,0,0,0,0,0],[0,8,0,0,0,0],[0,0,0,0,0,0]]); save("US3-n30-small", X, truth=t)
X=u.standard_normal((160,200)); t=np.repeat([0,1,2,3],40); X[t>=2,:20]+=3; X[t==1,20:30]+=3; X[t==3,30:40]+=3
save("US4-nested-wide-p200", X, truth=t)
X,t=ublobs([120,120],[[7,7,7,0,0,0,0,0],[0]*8],lambda m,p: u.standard_t(3,(m,p))); O=u.standard_normal((12,8))
O=O/np.linalg.norm(O,axis=1)[:,None]*20; save("US2-t3-12far", np.vstack([X,O]), truth=np.concatenate([t,-np.ones(12)]))
P=np.array([[4.5]*4+[1.5]*4+[3]*4,[1.5]*4+[4.5]*4+[3]*4,[3]*4+[3]*4+[4.5]*4]); t=np.repeat([0,1,2],60)
save("US3-likert-types", np.clip(np.round(P[t]+0.8*u.standard_normal((180,12))),1,5), truth=t)
A=np.full((2,10),2.0); A[0,0]=A[1,1]=8; t=np.repeat([0,1],100); save("US2-dirichlet-groups", np.vstack([u.dirichlet(A[g]) for g in t]), truth=t)
mu=np.exp(u.normal(3,1.5,(500,1)))*np.ones((500,60)); t=np.repeat(np.arange(5),12)
for g in range(5): mu[g*30:(g+1)*30, t==g]*=4
save_rows("US5-counts-rows", u.negative_binomial(5,5/(5+mu)), truth=t)
R=np.diag([3,1,1,1,1]); X,t=ublobs([120,80],[[0,0,0,0,0],[0,8,0,0,0]]); X[t==1]=(X[t==1]-[0,8,0,0,0])@R+[0,8,0,0,0]
save("US2-unequal-cov", X, truth=t)
X,t=ublobs([60,60,60],[[6,0,0]+[0]*9,[0,6,0]+[0]*9,[0,0,6]+[0]*9]); save("US3-mixed-units", X*np.logspace(-1,2,12), truth=t)
# --- added 3 Dec 2026 (evening), sixth generator, written and run once before any of its verdicts was seen. Prefix X:
# XN none, XS<k> k groups. Kinds: a full ring, very heavy tails (t2), skewed features with far samples, one factor over
# wide data, small wide noise; a small group in t3 noise, three families of two subgroups, small groups in wide data,
# a tight knot of far samples beside two groups, five groups in a row, groups of unequal spread, groups beside a
# processing batch, counts in rows, yes/no answers of two types.
x=np.random.default_rng(20261207)
def xblobs(sizes, centres, noise=lambda m,p: x.standard_normal((m,p))):
    return blobs(sizes, centres, noise)   # blobs of the fourth generator, drawing from this generator's seed
th=x.uniform(0,2*np.pi,200); save("XN-ring-p2", np.column_stack([5*np.cos(th),5*np.sin(th)])+0.4*x.standard_normal((200,2)))
save("XN-t2-p6", x.standard_normal((180,6))/np.sqrt(x.chisquare(2,(180,1))/2))
O=x.standard_normal((6,8)); O=O/np.linalg.norm(O,axis=1)[:,None]*15
save("XN-gamma-6far", np.vstack([x.gamma(2,1,(200,8)), 2+O]))
ld=np.zeros((1,300)); ld[0,:60]=x.uniform(0.5,1,60); save("XN-wide-factor-p300", x.standard_normal((120,1))@ld+x.standard_normal((120,300)))
save("XN-small-n40-p50", x.standard_normal((40,50)))
X,t=xblobs([90,10],[[0]*6,[8,8,8,8,0,0]],lambda m,p: x.standard_t(3,(m,p))); save("XS2-90-10-t3", X, truth=t)
F=np.array([[10,0],[0,10],[-10,0]]); C=[list(F[f]+s)+[0]*4 for f in range(3) for s in ([4,0],[0,4])]
X,t=xblobs([40]*6,C); save("XS6-nested-3x2", X, truth=t//2)
X=x.standard_normal((45,300)); t=np.repeat([0,1,2],15)
for g in range(3): X[t==g,g*20:(g+1)*20]+=2.5
save("XS3-wide-n45-p300", X, truth=t)
X,t=xblobs([70,70],[[8,8,8,0,0],[0]*5]); K=x.standard_normal((1,5)); K=K/np.linalg.norm(K)*25
save("XS2-4-knotted-far", np.vstack([X,K+0.3*x.standard_normal((4,5))]), truth=np.concatenate([t,-np.ones(4)]))
X,t=xblobs([40]*5,[[6*g,0,0,0,0] for g in range(5)]); save("XS5-in-a-row", X, truth=t)
X,t=xblobs([100,100],[[0]*5,[12,0,0,0,0]]); X[t==1]=(X[t==1]-[12,0,0,0,0])*3+[12,0,0,0,0]; save("XS2-spread-1-3", X, truth=t)
C=np.zeros((4,12))
for g in range(4): C[g,2*g:2*g+2]=7
X,t=xblobs([50]*4,C); X[::2]+=0.7; save("XS4-groups-batch", X, truth=t)
mu=np.exp(x.normal(3,1.5,(600,1)))*np.ones((600,45)); t=np.repeat([0,1,2],15)
for g in range(3): mu[g*40:(g+1)*40, t==g]*=3
save_rows("XS3-counts-rows", x.negative_binomial(5,5/(5+mu)), truth=t)
P=np.full((2,30),0.5); P[0,:10]=0.8; P[1,:10]=0.2; t=np.repeat([0,1],[100,80])
save("XS2-yes-no-types", (x.random((180,30))<P[t]).astype(float), truth=t)
