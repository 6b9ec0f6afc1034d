#!/usr/bin/python3
"""Independent reference values for the rolling engine's tests, computed with SciPy (QUADPACK quad,
Brent's brentq, Nelder-Mead) and mpmath from the plain geometric definitions -- not from the
engine's formulas. Reads {"cases": [...]} as JSON on stdin and prints {"results": [...]}.
Run with Debian's /usr/bin/python3 (python3-scipy 1.10, python3-mpmath 1.2)."""
import hashlib
import json
import math
import sys

import mpmath
import numpy as np
from scipy import integrate, optimize

QUAD = dict(epsabs=0.0, epsrel=1e-13, limit=1000)


def ray(t):
    # Body ray t of the engine's convention: t = 0 points straight down, t grows counter-clockwise.
    return math.sin(t), -math.cos(t)


def seg_dist(px, py, ax, ay, bx, by):
    ex, ey = bx - ax, by - ay
    s = max(0.0, min(1.0, ((px - ax) * ex + (py - ay) * ey) / (ex * ex + ey * ey)))
    return math.hypot(px - ax - s * ex, py - ay - s * ey)


def rounded_polygon_r(n, A, rho):
    """r(t) of the regular n-gon with inradius A whose corners are rounded with radius rho, found as
    the boundary of (polygon with inradius A - rho) grown by rho: dist(s*d, inner) = rho, by brentq."""
    Rc = (A - rho) / math.cos(math.pi / n)
    verts = [(Rc * math.sin(math.pi / n + 2 * math.pi * j / n), -Rc * math.cos(math.pi / n + 2 * math.pi * j / n)) for j in range(n)]

    def dist(px, py):
        return min(seg_dist(px, py, *verts[j], *verts[(j + 1) % n]) for j in range(n))

    inner = polygon_r(n, A - rho)

    def r(t):
        dx, dy = ray(t)
        # From the inner polygon's boundary (distance 0) outwards the distance grows monotonically.
        return optimize.brentq(lambda s: dist(s * dx, s * dy) - rho, inner(t), 2 * A + rho, xtol=1e-15, rtol=8.9e-16, maxiter=200)

    return r


def polygon_r(n, A):
    def r(t):
        best = math.inf
        for j in range(n):
            c = math.cos(t - 2 * math.pi * j / n)
            if c > 1e-12:
                best = min(best, A / c)
        return best
    return r


def outline_r(points, axle):
    q = [(x - axle[0], y - axle[1]) for x, y in points]
    m = len(q)

    def r(t):
        dx, dy = ray(t)
        best = math.inf
        for i in range(m):
            (ax, ay), (bx, by) = q[i], q[(i + 1) % m]
            ex, ey = bx - ax, by - ay
            den = dx * (-ey) - dy * (-ex)
            if abs(den) < 1e-300:
                continue
            # s*d = a + u*e  ->  solve for s, u
            s = (ax * (-ey) - ay * (-ex)) / den
            u = (dx * ay - dy * ax) / den
            if s > 0 and -1e-12 <= u <= 1 + 1e-12:
                best = min(best, s)
        return best
    return r


def extremes(r, lo, hi, breaks):
    ts = np.linspace(lo, hi, 4001)
    vals = [r(t) for t in ts]
    i_min, i_max = int(np.argmin(vals)), int(np.argmax(vals))
    cand_min = [vals[i_min]] + [r(b) for b in breaks]
    cand_max = [vals[i_max]] + [r(b) for b in breaks]
    for i, sign, cands in ((i_min, 1, cand_min), (i_max, -1, cand_max)):
        a, b = ts[max(0, i - 1)], ts[min(len(ts) - 1, i + 1)]
        res = optimize.minimize_scalar(lambda t: sign * r(t), bounds=(a, b), method="bounded", options=dict(xatol=1e-13))
        cands.append(sign * res.fun)
    return min(cand_min), max(cand_max)


def quad_pieces(f, knots):
    return sum(integrate.quad(f, knots[i], knots[i + 1], **QUAD)[0] for i in range(len(knots) - 1))


def case_rounded(c):
    n, A, rho = c["sides"], c["inradius"], c["cornerRadius"]
    r = rounded_polygon_r(n, A, rho)
    T = 2 * math.pi / n
    knots = [0.0, math.pi / n, T]
    period = quad_pieces(r, knots)
    rmin, rmax = extremes(r, 0.0, T, [0.0, math.pi / n])
    return dict(period=period, depth=rmax - rmin, rMin=rmin, rMax=rmax)


def case_partner_polygon(c):
    n, A, m = c["sides"], c["inradius"], c["lobes"]
    r = polygon_r(n, A)
    T = 2 * math.pi / n
    knots = [0.0, math.pi / n, T]
    rmax = A / math.cos(math.pi / n)
    F = lambda a: quad_pieces(lambda t: r(t) / (a - r(t)), knots) - 2 * math.pi / m
    a = optimize.brentq(F, rmax * (1 + 1e-9), 100 * rmax, xtol=1e-15, rtol=8.9e-16, maxiter=500)
    return dict(centreDistance=a)


def case_partner_rounded(c):
    n, A, rho, m = c["sides"], c["inradius"], c["cornerRadius"], c["lobes"]
    r = rounded_polygon_r(n, A, rho)
    T = 2 * math.pi / n
    knots = [0.0, math.pi / n, T]
    _, rmax = extremes(r, 0.0, T, [math.pi / n])
    F = lambda a: quad_pieces(lambda t: r(t) / (a - r(t)), knots) - 2 * math.pi / m
    a = optimize.brentq(F, rmax * (1 + 1e-9), 100 * rmax, xtol=1e-15, rtol=8.9e-16, maxiter=500)
    return dict(centreDistance=a)


def case_outline(c):
    pts, axle = c["points"], (c["axle"]["x"], c["axle"]["y"])
    r = outline_r(pts, axle)
    corners = sorted(math.atan2(y - axle[1], x - axle[0]) + math.pi / 2 for x, y in pts)
    corners = sorted((t % (2 * math.pi)) for t in corners)
    knots = [0.0] + [t for t in corners if 0 < t < 2 * math.pi] + [2 * math.pi]
    period = quad_pieces(r, knots)
    rmin, rmax = extremes(r, 0.0, 2 * math.pi, knots)
    out = dict(period=period, depth=rmax - rmin, rMin=rmin, rMax=rmax)
    if "lobes" in c:
        m = c["lobes"]
        F = lambda a: quad_pieces(lambda t: r(t) / (a - r(t)), knots) - 2 * math.pi / m
        out["centreDistance"] = optimize.brentq(F, rmax * (1 + 1e-9), 100 * rmax, xtol=1e-15, rtol=8.9e-16, maxiter=500)
    return out


def case_triangle_interference(c):
    """Deepest radial penetration of the track into the triangle (inradius A) rolling on its own
    catenary road y = -A cosh((x - jP)/A), |x - jP| <= h, over the whole roll (HW92 road)."""
    A = c["inradius"]
    n = 3
    h = A * math.asinh(math.tan(math.pi / n))
    P = 2 * h
    r = polygon_r(n, A)

    def road(x):
        j = round(x / P)
        return -A * math.cosh((x - j * P) / A)

    def pen(X, x):
        alpha = math.atan(math.sinh(X / A))  # wheel turn at axle x = X on the first arc (HW92)
        dy = road(x)
        bx = (x - X) * math.cos(alpha) - dy * math.sin(alpha)
        by = (x - X) * math.sin(alpha) + dy * math.cos(alpha)
        u = math.atan2(by, bx) + math.pi / 2
        return r(u) - math.hypot(bx, by)

    best = (-math.inf, 0, 0)
    for X in np.linspace(-h, h, 241):
        for x in np.linspace(X - 2.2 * A, X + 2.2 * A, 881):
            v = pen(X, x)
            if v > best[0]:
                best = (v, X, x)
    res = optimize.minimize(lambda z: -pen(z[0], z[1]), [best[1], best[2]], method="Nelder-Mead",
                            options=dict(xatol=1e-12, fatol=1e-15, maxiter=20000))
    return dict(depth=-res.fun, axleX=float(res.x[0]), x=float(res.x[1]), y=road(float(res.x[1])))


def case_generic_driver(c):
    k = c["lobes"]
    mpmath.mp.dps = 30
    r = lambda t: 1 + 0.3 * mpmath.cos(t) + 0.1 * mpmath.sin(2 * t)
    F = lambda a: mpmath.quad(lambda t: r(t) / (a - r(t)), [0, mpmath.pi, 2 * mpmath.pi]) - 2 * mpmath.pi / k
    a = mpmath.findroot(F, (1.4, (k + 1) * 1.35), solver="anderson")
    return dict(centreDistance=float(a))


def case_sha256(c):
    return dict(hex=hashlib.sha256(c["text"].encode("utf-8")).hexdigest(),
                canonical=json.dumps(json.loads(c["json"]), sort_keys=True, separators=(",", ":"), ensure_ascii=False) if "json" in c else None)


def case_brent(c):
    return dict(root=optimize.brentq(lambda x: math.cos(x) - x, 0, 1, xtol=1e-15, rtol=8.9e-16))


def case_quad(c):
    # ∫_0^1 exp(-x^2) dx = sqrt(pi)/2 erf(1), and the square's period by QUADPACK.
    return dict(gauss=float(mpmath.sqrt(mpmath.pi) / 2 * mpmath.erf(1)),
                sec=integrate.quad(lambda t: 1 / math.cos(t), 0, math.pi / 4, **QUAD)[0])


HANDLERS = {
    "rounded": case_rounded,
    "partner-polygon": case_partner_polygon,
    "partner-rounded": case_partner_rounded,
    "outline": case_outline,
    "triangle-interference": case_triangle_interference,
    "generic-driver": case_generic_driver,
    "sha256": case_sha256,
    "brent": case_brent,
    "quad": case_quad,
}

if __name__ == "__main__":
    req = json.load(sys.stdin)
    print(json.dumps({"results": [HANDLERS[c["kind"]](c) for c in req["cases"]]}))
