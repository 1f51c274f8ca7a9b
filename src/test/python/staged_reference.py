# Independent reference values for the double, multiple and sequential plan tests.
# Run with Debian's Python and python3-scipy 1.10.1-2: /usr/bin/python3 src/test/python/staged_reference.py
# Binomial and Poisson values use scipy.stats; hypergeometric, multiple and sequential values use exact
# rational arithmetic (fractions) over the whole lattice, a different method from lotgate's.
import scipy, numpy as np
from scipy.stats import binom, poisson
from fractions import Fraction as F
from math import comb
print("scipy", scipy.__version__)
# double plan 50,1,100,3 binomial
def dbl(n1,c1,r1,n2,c2,p):
    pa = binom.cdf(c1,n1,p) + sum(binom.pmf(d,n1,p)*binom.cdf(c2-d,n2,p) for d in range(c1+1,r1))
    pr = binom.sf(r1-1,n1,p) + sum(binom.pmf(d,n1,p)*binom.sf(c2-d,n2,p) for d in range(c1+1,r1))
    asn = n1 + n2*sum(binom.pmf(d,n1,p) for d in range(c1+1,r1))
    return pa,pr,asn
for p in [0.005,0.01,0.02,0.05,0.08]:
    print("double50", p, "%.17g %.17g %.17g" % dbl(50,1,4,100,3,p))
# curtailed ASN by enumerating second-sample stop positions exactly (negative binomial)
def curt(n1,c1,n2,c2,p):
    e = n1
    for d1 in range(c1+1,c2+1):
        k = c2+1-d1
        # E[min(n2,T_k)] = sum_t t P(T_k=t) for t<=n2 + n2 P(T_k>n2)
        ex = sum(t*comb(t-1,k-1)*p**k*(1-p)**(t-k) for t in range(k,n2+1)) + n2*binom.cdf(k-1,n2,p)
        e += binom.pmf(d1,n1,p)*ex
    return e
for p in [0.01,0.05,0.08]:
    print("curt50", p, "%.17g" % curt(50,1,100,3,p))
# Poisson double, per unit levels
def dblp(n1,c1,r1,n2,c2,l):
    pa = poisson.cdf(c1,n1*l) + sum(poisson.pmf(d,n1*l)*poisson.cdf(c2-d,n2*l) for d in range(c1+1,r1))
    pr = poisson.sf(r1-1,n1*l) + sum(poisson.pmf(d,n1*l)*poisson.sf(c2-d,n2*l) for d in range(c1+1,r1))
    return pa,pr
for l in [0.01,0.03]:
    print("poissondouble 40,0,3,80,2", l, "%.17g %.17g" % dblp(40,0,3,80,2,l))
# hypergeometric double, exact rationals: N=500, D, n1=30,c1=0,r1=3,n2=60,c2=2
def H(N,D,n,x):
    if x<0 or x>n or x>D or n-x>N-D: return F(0)
    return F(comb(D,x)*comb(N-D,n-x), comb(N,n))
def dblh(N,D,n1,c1,r1,n2,c2):
    pa = sum(H(N,D,n1,d) for d in range(0,c1+1))
    pr = sum(H(N,D,n1,d) for d in range(r1,min(n1,D)+1))
    aoq = sum(H(N,D,n1,d)*(D-d) for d in range(0,c1+1))
    for d in range(c1+1,r1):
        pa += H(N,D,n1,d)*sum(H(N-n1,D-d,n2,x) for x in range(0,c2-d+1))
        pr += H(N,D,n1,d)*sum(H(N-n1,D-d,n2,x) for x in range(c2-d+1,n2+1))
        aoq += H(N,D,n1,d)*sum(H(N-n1,D-d,n2,x)*(D-d-x) for x in range(0,c2-d+1))
    return pa,pr,aoq/N
for D in [5,20,40]:
    pa,pr,aoq = dblh(500,D,30,0,3,60,2)
    print("hyperdouble N500", D, "%.17g %.17g %.17g" % (float(pa),float(pr),float(aoq)))
# multiple plan 4 stages, binomial, exact rationals: stages (n,c,r)
stages=[(20,-1,3),(20,1,4),(20,2,5),(20,4,5)]
def multi(stages,p):
    p=F(p)
    going={0:F(1)}; acc=F(0); rej=F(0); asn=F(0)
    for (n,c,r) in stages:
        asn += n*sum(going.values())
        nxt={}
        for d,w in going.items():
            for x in range(0,n+1):
                pr = comb(n,x)*p**x*(1-p)**(n-x)
                t=d+x
                if t<=c: acc+=w*pr
                elif t>=r: rej+=w*pr
                else: nxt[t]=nxt.get(t,0)+w*pr
        going=nxt
    return acc,rej,asn
for p in ["1/100","1/20","1/10"]:
    a,r,s = multi(stages,F(p))
    print("multi4", p, "%.17g %.17g %.17g" % (float(a),float(r),float(s)))
# sequential: naive full-lattice with exact fractions, item by item, binomial
import math
def seqexact(h1,h2,s,nt,p):
    p=F(p)
    act = math.floor(s*nt)
    def A(m): return act if m==nt else max(-1, math.floor(s*m-h1))
    def R(m): return act+1 if m==nt else min(act+1, math.ceil(h2+s*m))
    going={0:F(1)}; acc=F(0); rej=F(0); asn=F(0)
    for m in range(1,nt+1):
        asn += sum(going.values())
        nxt={}
        for d,w in going.items():
            for x,pr in ((0,1-p),(1,p)):
                t=d+x
                if t<=A(m): acc+=w*pr
                elif t>=R(m): rej+=w*pr
                else: nxt[t]=nxt.get(t,0)+w*pr
        going=nxt
        if not going: break
    return acc,rej,asn
k=math.log(0.06*0.99/(0.01*0.94)); h1=math.log(0.95/0.10)/k; h2=math.log(0.90/0.05)/k; s=math.log(0.99/0.94)/k
print("wald", "%.17g %.17g %.17g" % (h1,h2,s))
for p in ["1/100","3/100","6/100"]:
    a,r,n = seqexact(h1,h2,s,180,F(p))
    print("seq180", p, "%.17g %.17g %.17g" % (float(a),float(r),float(n)))
# The designed double plans of the command-line tests: n1 = 69, c1 = 0, r1 = 4, n2 = 69, c2 = 3 (equal samples)
# and n1 = 60, c1 = 0, r1 = 4, n2 = 82, c2 = 3 (free second sample), at the AQL 1% and the LTPD 5%.
for (n1,c1,r1,n2,c2) in [(69,0,4,69,3),(60,0,4,82,3)]:
    for p in [0.01,0.05]:
        print("designed", n1, n2, p, "%.17g %.17g %.17g" % dbl(n1,c1,r1,n2,c2,p))
# Wald's approximate OC and ASN away from the design points, from the OC curve's parametric form
# p(h) = (1 - b^h)/(a^h - b^h), Pa(h) = (A^h - 1)/(A^h - B^h), solved for h with scipy.optimize.brentq.
from scipy.optimize import brentq
p1,al,p2,be = 0.01,0.05,0.06,0.10
a_,b_ = p2/p1,(1-p2)/(1-p1)
A,B = (1-be)/al, be/(1-al)
for p in [0.003,0.03,0.1]:
    h = brentq(lambda h: (1-b_**h)/(a_**h-b_**h) - p, -50, 50) if abs(p-s)>1e-12 else 0
    pa = (A**h-1)/(A**h-B**h)
    drift = p*math.log(a_) + (1-p)*math.log(b_)
    asn = (pa*math.log(B) + (1-pa)*math.log(A))/drift
    print("waldcurve", p, "%.17g %.17g" % (pa, asn))
# Exact AOQ and ATI of the truncated sequential plan for a lot of 2000 (type B), exact rationals.
def seqaoq(h1,h2,s,nt,p,N):
    p=F(p)
    act = math.floor(s*nt)
    def Ac(m): return act if m==nt else max(-1, math.floor(s*m-h1))
    def Re(m): return act+1 if m==nt else min(act+1, math.ceil(h2+s*m))
    going={0:F(1)}; out=F(0); ati=F(0)
    for m in range(1,nt+1):
        nxt={}
        for d,w in going.items():
            for x,pr in ((0,1-p),(1,p)):
                t=d+x
                if t<=Ac(m): out+=w*pr*p*(N-m)/N; ati+=w*pr*m
                elif t>=Re(m): ati+=w*pr*N
                else: nxt[t]=nxt.get(t,0)+w*pr
        going=nxt
        if not going: break
    return out,ati
o,t = seqaoq(h1,h2,s,180,F(3,100),2000)
print("seqaoq 0.03 N2000 %.17g %.17g" % (float(o), float(t)))
# Curtailed ASN of the Poisson double plan (40, 0, 3; 80, 2) at 0.03 per unit: the second sample's units
# inspected until the count reaches the rejection number, summed over every stopping unit.
def curtp(n1,c1,n2,c2,l):
    e=n1
    for d1 in range(c1+1,c2+1):
        k=c2+1-d1
        # E[min(n2, T)] = sum over j < n2 of P(Poisson(j l) < k)
        ex=sum(poisson.cdf(k-1,j*l) for j in range(0,n2))
        e+=poisson.pmf(d1,n1*l)*ex
    return e
print("curtpoisson 0.03 %.17g" % curtp(40,0,80,2,0.03))
