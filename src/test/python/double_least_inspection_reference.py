# Independent reference values for the double least-inspection plan: exact rationals (fractions and math.comb)
# and, as a second opinion, scipy.stats.hypergeom. Run with Debian's Python 3.11.2 and python3-scipy 1.10.1:
# /usr/bin/python3 src/test/python/double_least_inspection_reference.py (SciPy 1.17.1 prints the same digits)
# A double plan (n1, c1, n2, c2) with r1 = c2 + 1 accepts when d1 <= c1, or when c1 < d1 <= c2 and d1 + d2 <= c2;
# with rectification ATI = n1 Pa1 + (n1 + n2) Pa2 + N (1 - Pa).
import sys
from fractions import Fraction
from math import comb

import scipy
from scipy.stats import hypergeom

print("python", sys.version.split()[0], "scipy", scipy.__version__)


def pmf(lot, bad, n, x):
    return Fraction(comb(bad, x) * comb(lot - bad, n - x), comb(lot, n))


def parts(lot, bad, n1, c1, n2, c2):
    first = sum(pmf(lot, bad, n1, x) for x in range(0, c1 + 1))
    second = sum(pmf(lot, bad, n1, x) * sum(pmf(lot - n1, bad - x, n2, y) for y in range(0, c2 - x + 1))
                 for x in range(c1 + 1, c2 + 1))
    return first, second


def ati(lot, bad, n1, c1, n2, c2):
    first, second = parts(lot, bad, n1, c1, n2, c2)
    return n1 * first + (n1 + n2) * second + lot * (1 - first - second)


def scipy_ati(lot, bad, n1, c1, n2, c2):
    first = hypergeom.cdf(c1, lot, bad, n1)
    second = sum(hypergeom.pmf(x, lot, bad, n1) * hypergeom.cdf(c2 - x, lot - n1, bad - x, n2)
                 for x in range(c1 + 1, c2 + 1))
    return n1 * first + (n1 + n2) * second + lot * (1 - first - second)


# N = 5,000, LTPD 5% (D = 250), process average 0.5% (D = 25): lotgate's plan 51, 0, 134, 4.
lot, at_ltpd, at_average = 5000, 250, 25
plan = (51, 0, 134, 4)
pa = sum(parts(lot, at_ltpd, *plan))
print("P(accept | LTPD) of", plan, "%.17g" % float(pa), "<= 0.10:", pa <= Fraction(1, 10))
smaller = (51, 0, 133, 4)
print("P(accept | LTPD) of", smaller, "%.17g" % float(sum(parts(lot, at_ltpd, *smaller))))
value = ati(lot, at_average, *plan)
print("ATI exact", "%.17g" % float(value), "scipy", "%.17g" % scipy_ati(lot, at_average, *plan))
