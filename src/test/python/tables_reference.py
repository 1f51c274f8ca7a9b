# Independent reference values for the table look-up risks and the least-inspection (Dodge-Romig) plans.
# Run with Debian's Python and python3-scipy 1.10.1-2: /usr/bin/python3 src/test/python/tables_reference.py
# The risks use scipy.stats binom/poisson and brentq/minimize_scalar; the least-inspection plans are found
# by brute force over every (n, c) with scipy.stats binom (hypergeom for a lot of 2,000), a different
# method from lotgate's bisection per acceptance number.
import scipy
from scipy.stats import binom, poisson, hypergeom
from scipy.optimize import brentq, minimize_scalar
print("scipy", scipy.__version__)

def risks(n, c, re, aql, lot):
    # P(reject at the AQL), quality at P(accept) 10%, 5%, 50%, AOQL with (N - n)/N
    pr = binom.sf(re - 1, n, aql)
    q = [brentq(lambda p: binom.cdf(re - 1, n, p) - t, 1e-12, 1 - 1e-12, xtol=1e-15) for t in (0.10, 0.05, 0.5)]
    top = q[1] * 3
    r = minimize_scalar(lambda p: -binom.cdf(re - 1, n, p) * p * (lot - n) / lot, bounds=(0, top),
                        method="bounded", options={"xatol": 1e-13})
    return pr, q, -r.fun
# K (125) 2/3 at AQL 0.65%, lot 2,000; G (32) 1/2 at 1.5%, lot 200; reduced K (50) 1/3 at 0.65%, lot 2,000
for (n, c, re, aql, lot) in [(125, 2, 3, 0.0065, 2000), (32, 1, 2, 0.015, 200), (50, 1, 3, 0.0065, 2000)]:
    pr, q, aoql = risks(n, c, re, aql, lot)
    print("risks", n, c, re, aql, lot, "%.17g" % pr, " ".join("%.17g" % v for v in q), "%.17g" % aoql)
    if re > c + 1:
        print("  reinstate", "%.17g" % sum(binom.pmf(x, n, aql) for x in range(c + 1, re)))
# double K: n 80+80, 0/3, 3/4 at 0.65%: ASN = n1 + n2 P(0 < d1 < 3)
p = 0.0065
print("asn double 80 0/3 3/4", "%.17g" % (80 + 80 * (binom.pmf(1, 80, p) + binom.pmf(2, 80, p))))
pa = binom.cdf(0, 80, p) + sum(binom.pmf(d, 80, p) * binom.cdf(3 - d, 80, p) for d in (1, 2))
print("pa double 80 0/3 3/4", "%.17g" % pa)

def least_ltpd(lot, ltpd, beta, avg, dist):
    best = (lot, None)
    for c in range(0, 60):
        for n in range(c + 1, lot + 1):
            if dist.cdf(c, n, ltpd) <= beta:
                ati = n + (lot - n) * dist.sf(c, n, avg)
                if ati < best[0]:
                    best = (ati, (n, c))
                break  # ATI grows with n for a fixed c
    return best
class B:
    cdf = staticmethod(lambda c, n, p: binom.cdf(c, n, p))
    sf = staticmethod(lambda c, n, p: binom.sf(c, n, p))
print("least ltpd binomial 5000 5% 10% 0.5%", least_ltpd(5000, 0.05, 0.10, 0.005, B))
print("least ltpd binomial 1000000 1% 10% 0.25%", least_ltpd(1000000, 0.01, 0.10, 0.0025, B) if False else "skipped")
class H2000:
    # lot of 2,000: D = 20 at the LTPD 1% (rounded up), D = 5 at the process average 0.25%
    cdf = staticmethod(lambda c, n, p: hypergeom.cdf(c, 2000, round(p * 2000) if p != 0.01 else 20, n))
    sf = staticmethod(lambda c, n, p: hypergeom.sf(c, 2000, round(p * 2000), n))
print("least ltpd hypergeometric 2000 1% 10% 0.25%", least_ltpd(2000, 0.01, 0.10, 0.0025, H2000))

def least_aoql(lot, target, avg):
    best = (lot, None)
    for c in range(0, 40):
        for n in range(c + 1, lot + 1):
            r = minimize_scalar(lambda p: -binom.cdf(c, n, p) * p * (lot - n) / lot, bounds=(0, min(1, 20 * (c + 1) / n)),
                                method="bounded", options={"xatol": 1e-12})
            if -r.fun <= target:
                ati = n + (lot - n) * binom.sf(c, n, avg)
                if ati < best[0]:
                    best = (ati, (n, c), -r.fun)
                break
    return best
print("least aoql binomial 5000 2% 0.5%", least_aoql(5000, 0.02, 0.005))

# The example: lot of 5,000, LTPD 5% (D = 250), process average 0.5% (D = 25), hypergeometric, in
# exact rationals (fractions and math.comb, Python 3.11): for each c the smallest protecting n, then the least ATI.
from fractions import Fraction
from math import comb
def hyper_cdf(c, lot, d, n):
    return Fraction(sum(comb(d, x) * comb(lot - d, n - x) for x in range(0, min(c, d) + 1)), comb(lot, n))
def least_ltpd_exact(lot, d_ltpd, beta, d_avg):
    best = (lot, None)
    for c in range(0, 12):
        lo, hi = c, lot
        while hi - lo > 1:
            mid = (lo + hi) // 2
            if hyper_cdf(c, lot, d_ltpd, mid) <= beta:
                hi = mid
            else:
                lo = mid
        n = hi
        ati = n + (lot - n) * (1 - hyper_cdf(c, lot, d_avg, n))
        if ati < best[0]:
            best = (ati, (n, c))
    return best
ati, plan = least_ltpd_exact(5000, 250, Fraction(1, 10), 25)
print("least ltpd hypergeometric 5000 5% 10% 0.5%", plan, "%.17g" % float(ati))
