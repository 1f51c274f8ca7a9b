# Independent reference values for the variables-plan tests (k-method, one limit).
# Run with Debian's Python and python3-scipy 1.10.1-2: /usr/bin/python3 src/test/python/variables_reference.py
# The noncentral t comes from scipy.stats.nct (Boost's implementation), the normal from scipy.stats.norm.
import math
import scipy
import numpy as np
from scipy.stats import nct, norm, anderson
print("scipy", scipy.__version__)
cases=[(1.5,10,1.0),(2.0,5,0.5),(-1.0,20,0.3),(0.5,3,2.0),(10.0,40,9.0),(25.0,99,23.0),(30.0,149,28.0),
       (3.0,14,4.5),(-0.5,7,-1.2),(0.0,12,1.0),(6.0,200,7.3),(2.5,2,1.0),(40.0,300,39.5),(12.0,60,14.0)]
for t,df,d in cases:
    print("nct %r, %r, %r, %.17g, %.17g" % (t,df,d,nct.cdf(t,df,d),nct.sf(t,df,d)))
for q,df,d in [(0.05,41,15.0),(0.9,41,10.0),(0.5,9,2.0)]:
    print("nctppf %r %r %r %.17g" % (q,df,d,nct.ppf(q,df,d)))
def design(p1,a,p2,b):
    z1,z2,za,zb = norm.isf(p1),norm.isf(p2),norm.isf(a),norm.isf(b)
    exact=((za+zb)/(z1-z2))**2
    n=max(2,math.ceil(exact))
    while True:
        r=math.sqrt(n)
        lo=nct.ppf(1-b,n-1,r*z2)/r
        hi=nct.ppf(a,n-1,r*z1)/r
        if lo<=hi: return n,lo,hi,exact
        n+=1
for pts in [(0.01,0.05,0.06,0.10),(0.001,0.05,0.005,0.10),(0.025,0.05,0.10,0.10),(0.0025,0.05,0.02,0.10)]:
    n,lo,hi,exact=design(*pts)
    k=(lo+hi)/2
    r=math.sqrt(n)
    pr=nct.cdf(k*r,n-1,r*norm.isf(pts[0])); cr=nct.sf(k*r,n-1,r*norm.isf(pts[2]))
    print("design unknown", pts, n, "%.17g %.17g %.17g %.17g" % (lo,hi,pr,cr))
# Anderson-Darling statistic (normal, mean and sd estimated) for fixed samples
samples={"a":[9.98,10.02,10.01,9.97,10.00,10.03,9.99,10.04,9.96,10.01,10.00,9.98],
         "b":[1,1,1,2,2,3,5,8,13,21]}
for name,x in samples.items():
    r=anderson(np.array(x,dtype=float),'norm')
    print("anderson", name, "%.17g" % r.statistic)
# The M-method's estimate for an unknown sigma: I_x((n-2)/2, (n-2)/2) with x = 1/2 - Q sqrt(n)/(2(n-1)),
# from scipy.stats.beta.cdf; and the exact 95% upper bound on the fraction beyond the limit: the d with
# P(T' >= sqrt(n) Q | d) = 5%, by scipy.optimize.brentq, as Phi(-d/sqrt(n)).
from scipy.stats import beta
from scipy.optimize import brentq
for n,q in [(42,1.9),(42,2.5),(10,1.2)]:
    x=max(0.0,min(1.0,0.5-q*math.sqrt(n)/(2*(n-1))))
    est=beta.cdf(x,(n-2)/2,(n-2)/2)
    t=math.sqrt(n)*q
    d=brentq(lambda d: nct.sf(t,n-1,d)-0.05, t-40, t+40, xtol=1e-14)
    print("mvue %d %r %.17g bound %.17g" % (n,q,est,norm.cdf(-d/math.sqrt(n))))
