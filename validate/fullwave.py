"""Shared set-up for the openEMS reference cases of docs/fullwave/README.md.

Lengths in millimetres (the CSXCAD drawing unit is set to 1 mm), frequencies in Hz.
Every case is a straight wire on the z axis.  Only the half z >= 0 is modelled: the plane
z = 0 is a PEC wall, the mirror that turns the half-structure into the whole one (the
current of a centre-fed or broadside-lit straight wire is even in z, so the tangential E of
its field vanishes there; image theory).  The other five faces are PML.
"""
import math
import os
import shutil
import subprocess
import time

import numpy as np
from CSXCAD import ContinuousStructure
from openEMS import openEMS

from mesh import graded_lines, max_ratio

C0 = 299792458.0
EPS0 = 8.8541878128e-12
F_CENTRE = 5.8e9
F_SPAN = 2.5e9          # Gaussian pulse: -20 dB at F_CENTRE +- F_SPAN
GAP_MM = 0.5            # fixed physical feed gap, the same on every mesh
RATIO = 1.22            # cell growth away from the wire (<= 1.3 after rounding)
SMAX_MM = 2.0           # largest cell, about lambda/20 at the top of the pulse's band
CLEAR_MM = 15.0         # wire to PML, about lambda/3.4 at 5.8 GHz
PML_CELLS = 8
END_CRITERIA = 1e-4     # stop when the field energy has fallen 40 dB
THREADS = int(os.environ.get("FULLWAVE_THREADS", "2"))
WORK = os.environ.get("FULLWAVE_WORK", "/tmp/helipol-fullwave")
# Where the tables go: the committed ones by default; the smoke run points this at a scratch folder
# so that a short check never overwrites the committed figures.
TABLES = os.environ.get("FULLWAVE_TABLES",
                        os.path.join(os.path.dirname(os.path.abspath(__file__)), "..", "docs", "fullwave"))

# Tape and foam of the loading cases (README "Dielectric surroundings").
TAPE_T = 0.15
TAPE_EPS, TAPE_TAND = 3.0, 0.02
FOAM_EPS, FOAM_HALF_W, FOAM_DEPTH, FOAM_OVERHANG = 1.05, 5.0, 4.0, 2.0
GLUE_EPS = 2.5


def openems_version():
    try:
        out = subprocess.run(["dpkg-query", "-W", "-f=${Version}", "openems"],
                             capture_output=True, text=True, check=True).stdout.strip()
        return out or "unknown"
    except (OSError, subprocess.CalledProcessError):
        return "unknown"


def loss_kappa(eps_r, tand, f=F_CENTRE):
    """Conductivity giving loss tangent tand at f (S/m)."""
    return 2.0 * math.pi * f * EPS0 * eps_r * tand


# ---------------------------------------------------------------- mesh

def make_mesh(cell, radius, length, x_fine=None, y_fine=None, extra_x=(), extra_y=(),
              extra_z=(), gap=True, x_zones=()):
    """Graded mesh (x, y, z lines in mm) around a wire of the given radius and length.

    Cells of size `cell` cover the wire's cross-section (plus two cells); along z the cells
    at the feed gap and at the wire's end are 2*cell (the field varies slowly along the
    wire, fast only across it), at most 0.4 mm along the wire.
    """
    xf = x_fine if x_fine is not None else radius + 2 * cell
    yf = y_fine if y_fine is not None else (-xf, xf)
    half = length / 2.0
    ext = max(half, 3.0) + CLEAR_MM
    xy_zones_x = [(-xf, xf, cell)] + list(x_zones)
    xy_zones_y = [(yf[0], yf[1], cell)]
    x = graded_lines(-CLEAR_MM - xf, CLEAR_MM + xf, xy_zones_x,
                     [0.0, radius, -radius] + list(extra_x), SMAX_MM, RATIO)
    y = graded_lines(-CLEAR_MM - xf, CLEAR_MM + xf, xy_zones_y,
                     [0.0, radius, -radius] + list(extra_y), SMAX_MM, RATIO)
    hz = min(2 * cell, GAP_MM / 4)
    z_zones = [(0.0, GAP_MM / 2 if gap else hz, hz), (half - hz, half + hz, hz),
               (0.0, half, 0.4)]
    zfix = [half] + ([GAP_MM / 2] if gap else []) + list(extra_z)
    z = graded_lines(0.0, half + CLEAR_MM, z_zones, zfix, SMAX_MM, RATIO)
    return x, y, z


def describe_mesh(x, y, z, cell):
    n = len(x) * len(y) * len(z)
    return (f"cell {cell:g} mm across the wire, 2x that along z at the gap and the wire end, "
            f"growth <= {max(max_ratio(x), max_ratio(y), max_ratio(z)):.2f} per cell, "
            f"largest {SMAX_MM:g} mm; {len(x)}x{len(y)}x{len(z)} = {n} cells")


# ---------------------------------------------------------------- geometry

def tape_hug_polygon(a, t, w):
    """Outline (x, y) of the tape hugging the wire (README `tape-hug`), one U-shaped piece."""
    pts = [(w, -a), (w, -a + t), (a + t, -a + t), (a + t, 0.0)]
    th = np.linspace(0.0, math.pi, 49)
    pts += [((a + t) * math.cos(v), (a + t) * math.sin(v)) for v in th]
    pts += [(-a - t, -a + t), (-w, -a + t), (-w, -a), (-a, -a), (-a, 0.0)]
    pts += [(a * math.cos(v), a * math.sin(v)) for v in th[::-1]]
    pts += [(a, -a)]
    return pts


def tape_tent_polygon(a, t, d, w):
    """Outline of the tape tented over the wire down to the foam at |x| = d.

    The inner face of the tape runs from the foam point (d, -a) along the line tangent to
    the wire (r = a), over the wire's top, and down to (-d, -a); the outer face is the
    inner one offset by t.  Flat on the foam (-a <= y <= -a + t) out to |x| = w.
    """
    px, py = d, -a
    phi = math.atan2(py, px)
    th_t = phi + math.acos(a / math.hypot(px, py))      # tangent point on r = a (x > 0)
    n = (math.cos(th_t), math.sin(th_t))                # outward normal of the sloped run
    tx, ty = (a + t) * n[0], (a + t) * n[1]             # tangent point on the outer face
    # outer face: the line through (tx, ty) with direction (P - T); where it meets y = -a + t
    dx, dy = px - a * n[0], py - a * n[1]
    s = (-a + t - ty) / dy
    cx = tx + s * dx
    arc_o = np.linspace(th_t, math.pi - th_t, 49)
    arc_i = arc_o[::-1]
    pts = [(w, -a), (w, -a + t), (cx, -a + t)]
    pts += [((a + t) * math.cos(v), (a + t) * math.sin(v)) for v in arc_o]
    pts += [(-cx, -a + t), (-w, -a + t), (-w, -a), (-d, -a)]
    pts += [(a * math.cos(v), a * math.sin(v)) for v in arc_i]
    pts += [(d, -a)]
    return pts


def add_surroundings(csx, case, a, length):
    """Add the dielectrics of a loading case; returns nothing for `bare`."""
    half = length / 2.0
    tape_kappa = loss_kappa(TAPE_EPS, TAPE_TAND)
    if case == "bare":
        return
    if case != "sleeve":
        foam = csx.AddMaterial("foam", epsilon=FOAM_EPS)
        foam.AddBox([-FOAM_HALF_W, -a - FOAM_DEPTH, 0.0],
                    [FOAM_HALF_W, -a, half + FOAM_OVERHANG], priority=10)
    tape = csx.AddMaterial("tape", epsilon=TAPE_EPS, kappa=tape_kappa)
    if case == "sleeve":
        tape.AddCylindricalShell([0, 0, 0], [0, 0, half], a + TAPE_T / 2, TAPE_T, priority=50)
        return
    if case == "foam":
        return
    if case in ("tape-hug", "tape-hug-glue"):
        pts = tape_hug_polygon(a, TAPE_T, FOAM_HALF_W)
    elif case.startswith("tape-tent-"):
        pts = tape_tent_polygon(a, TAPE_T, float(case[len("tape-tent-"):]), FOAM_HALF_W)
    else:
        raise ValueError(f"unknown loading case {case}")
    arr = np.array(pts).T
    tape.AddLinPoly(points=arr, norm_dir="z", elevation=0.0, length=half, priority=50)
    if case == "tape-hug-glue":
        glue = csx.AddMaterial("glue", epsilon=GLUE_EPS)
        glue.AddBox([-a, -a, 0.0], [a, 0.0, half], priority=40)


def loading_mesh(cell, a, length):
    """The one mesh of every loading case at this cell size (the same as `bare`'s), so that the
    shifts compare like with like.  Cells of `cell` over the wire and its tape, 1.5 * cell over
    the tents' sloped runs (|x| <= 1.2 mm), lines on every tape and foam face."""
    t = TAPE_T
    ex = [a + t, -a - t, FOAM_HALF_W, -FOAM_HALF_W, 0.5, -0.5, 1.0, -1.0]
    ey = [-a + t, a + t, -a - FOAM_DEPTH]
    xf = a + t + 2 * cell
    return make_mesh(cell, a, length, x_fine=xf, y_fine=(-a - 2 * cell, xf), extra_x=ex,
                     extra_y=ey, extra_z=[length / 2 + FOAM_OVERHANG],
                     x_zones=[(-1.2, 1.2, 1.5 * cell)])


# ---------------------------------------------------------------- runs

def _setup(cell_lines, pulse=True):
    fdtd = openEMS(NrTS=2_000_000, EndCriteria=END_CRITERIA)
    fdtd.SetGaussExcite(F_CENTRE, F_SPAN)
    fdtd.SetBoundaryCond(["PML_8", "PML_8", "PML_8", "PML_8", "PEC", "PML_8"])
    csx = ContinuousStructure()
    fdtd.SetCSX(csx)
    grid = csx.GetGrid()
    grid.SetDeltaUnit(1e-3)
    x, y, z = cell_lines
    grid.SetLines("x", x)
    grid.SetLines("y", y)
    grid.SetLines("z", z)
    return fdtd, csx


def _run(fdtd, name):
    path = os.path.abspath(os.path.join(WORK, name))
    if os.path.isdir(path):
        shutil.rmtree(path)
    os.makedirs(path)
    t0 = time.time()
    cwd = os.getcwd()
    try:
        fdtd.Run(path, cleanup=True, verbose=0, numThreads=THREADS)
    finally:
        os.chdir(cwd)     # Run() enters the run folder, which is removed after reading
    return path, time.time() - t0


def _probe(path, name):
    data = np.loadtxt(os.path.join(path, name), comments="%")
    return data[:, 0], data[:, 1]


def dft(t, v, freqs):
    """Fourier transform of a sampled signal at the given frequencies (rectangle rule)."""
    dt = t[1] - t[0]
    return np.array([np.sum(v * np.exp(-2j * math.pi * f * t)) * dt for f in freqs])


def fed_dipole(name, length, diameter, cell, surroundings="bare", mesh=None,
               freqs=np.arange(3.6e9, 8.0e9 + 1, 2e6)):
    """Input impedance of the centre-fed dipole over freqs; returns (freqs, Z, seconds, mesh)."""
    a = diameter / 2.0
    half = length / 2.0
    g2 = GAP_MM / 2.0
    lines = mesh if mesh is not None else make_mesh(cell, a, length)
    fdtd, csx = _setup(lines)
    wire = csx.AddMetal("wire")
    wire.AddCylinder([0, 0, g2], [0, 0, half], a, priority=100)
    add_surroundings(csx, surroundings, a, length)
    # Lumped port across the half gap, z = 0 (the mirror) to g/2, over the wire's
    # cross-section: a 37.5-ohm resistor here is 75 ohm across the whole gap.
    port = csx.AddLumpedElement("port_R", ny="z", caps=True, R=37.5)
    port.AddBox([-a, -a, 0.0], [a, a, g2], priority=110)
    exc = csx.AddExcitation("port_exc", exc_type=0, exc_val=[0, 0, -1.0])
    exc.AddBox([-a, -a, 0.0], [a, a, g2], priority=110)
    u = csx.AddProbe("ut", p_type=0, weight=-1)
    u.AddBox([0, 0, 0.0], [0, 0, g2])
    i = csx.AddProbe("it", p_type=1, weight=1, norm_dir=2)
    i.AddBox([-a, -a, g2 / 2], [a, a, g2 / 2])
    path, secs = _run(fdtd, name)
    tu, vu = _probe(path, "ut")
    ti, vi = _probe(path, "it")
    U = dft(tu, vu, freqs)
    I = dft(ti, vi, freqs)
    # The mirror doubles the gap voltage and keeps the current: Z = 2 U / I.
    z = 2.0 * U / I
    shutil.rmtree(path, ignore_errors=True)
    return freqs, z, secs, lines


def lit_element(name, length, diameter, cell, freqs=np.arange(3.6e9, 8.0e9 + 1, 2e6)):
    """Centre current of the unfed wire lit broadside by a plane wave, per unit incident field.

    The plane wave travels along +y with E along z; its total-field box encloses the wire and
    rests on the z = 0 mirror, where E_z (normal to it) is allowed.
    """
    a = diameter / 2.0
    half = length / 2.0
    lines = make_mesh(cell, a, length, gap=False)
    fdtd, csx = _setup(lines)
    wire = csx.AddMetal("wire")
    wire.AddCylinder([0, 0, 0.0], [0, 0, half], a, priority=100)
    box = 3.0
    pw = csx.AddExcitation("plane_wave", exc_type=10, exc_val=[0, 0, 1.0])
    pw.SetPropagationDir([0, 1, 0])
    pw.SetFrequency(F_CENTRE)
    pw.AddBox([-box, -box, 0.0], [box, box, half + box])
    # current through the plane just above the mirror (the wire's centre)
    zc = lines[2][1] / 2.0
    i = csx.AddProbe("it", p_type=1, weight=1, norm_dir=2)
    i.AddBox([-a - cell, -a - cell, zc], [a + cell, a + cell, zc])
    path, secs = _run(fdtd, name)
    ti, vi = _probe(path, "it")
    I = dft(ti, vi, freqs)
    # openEMS writes the excitation signal (the incident field's time course) to `et`
    exc_t, exc_v = _probe(path, "et")
    E = dft(exc_t, exc_v, freqs)
    shutil.rmtree(path, ignore_errors=True)
    return freqs, I / E, secs, lines


# ---------------------------------------------------------------- extraction

def zero_crossing(freqs, z):
    """First frequency where X = Im Z goes from - to + (linear interpolation), and R there."""
    x = z.imag
    for k in range(len(freqs) - 1):
        if x[k] < 0.0 <= x[k + 1]:
            w = -x[k] / (x[k + 1] - x[k])
            f = freqs[k] + w * (freqs[k + 1] - freqs[k])
            r = z.real[k] + w * (z.real[k + 1] - z.real[k])
            return f, r
    raise RuntimeError("no reactance zero in the band")


def peak(freqs, mag):
    """Frequency of the largest value, refined by a parabola through the three samples."""
    k = int(np.argmax(mag))
    if k == 0 or k == len(mag) - 1:
        raise RuntimeError("peak at the band edge")
    y0, y1, y2 = mag[k - 1], mag[k], mag[k + 1]
    off = 0.5 * (y0 - y2) / (y0 - 2 * y1 + y2)
    return freqs[k] + off * (freqs[k + 1] - freqs[k])


def richardson(cells, values):
    """Fit f(h) = f0 + c h^p through three (h, f) with h in ratio 2 (Richardson, order p).

    Returns (f0, p).  Falls back to first order (p = 1) from the two finest when the three
    points are not monotone (no positive order exists).
    """
    order = np.argsort(cells)[::-1]
    h = np.array(cells)[order]
    f = np.array(values)[order]
    if len(h) >= 3:
        d1, d2 = f[0] - f[1], f[1] - f[2]
        r = h[0] / h[1]
        if d1 * d2 > 0 and abs(d2) < abs(d1) and abs(h[1] / h[2] - r) < 1e-9:
            p = math.log(d1 / d2) / math.log(r)
            return f[2] - d2 / (r ** p - 1.0), p
    r = h[-2] / h[-1]
    return f[-1] + (f[-1] - f[-2]) / (r - 1.0), 1.0


# ---------------------------------------------------------------- tables

class Table:
    """A CSV table rewritten after each row, so a cut-short run keeps its finished rows.

    With FULLWAVE_RESUME=1 the rows and comment lines already in the file are kept (a row
    is replaced when its key, the first `key` columns, is produced again), so a table can be
    filled one mesh or one case at a time; otherwise the table starts empty.
    """

    def __init__(self, path, header, comments, key=2):
        self.path, self.header, self.key = path, header, key
        self.comments, self.rows = [], []
        if os.path.exists(path) and os.environ.get("FULLWAVE_RESUME") == "1":
            with open(path, encoding="utf-8") as fh:
                for line in fh:
                    line = line.rstrip("\n")
                    if line.startswith("#"):
                        self.comments.append(line[1:].strip())
                    elif line and line != ",".join(header):
                        self.rows.append(line.split(","))
        for c in comments:
            self.comment(c)

    def find(self, key):
        """The row with this key when resuming (FULLWAVE_RESUME=1), else None."""
        if os.environ.get("FULLWAVE_RESUME") != "1":
            return None
        for r in self.rows:
            if r[:self.key] == key:
                return r
        return None

    def comment(self, text):
        if text not in self.comments:
            self.comments.append(text)

    def add_last(self, row):
        """Add or replace a row and move it after its case's other rows (the extrapolation)."""
        self.rows = [r for r in self.rows if r[:self.key] != row[:self.key]]
        last = max([n for n, r in enumerate(self.rows) if r[0] == row[0]], default=len(self.rows) - 1)
        self.rows.insert(last + 1, row)
        self.write()

    def add(self, row):
        k = row[:self.key]
        for n, r in enumerate(self.rows):
            if r[:self.key] == k:
                self.rows[n] = row
                break
        else:
            self.rows.append(row)
        self.write()

    def write(self):
        tmp = self.path + ".tmp"
        with open(tmp, "w", encoding="utf-8", newline="\n") as fh:
            for c in self.comments:
                fh.write(f"# {c}\n")
            fh.write(",".join(self.header) + "\n")
            for r in self.rows:
                fh.write(",".join(r) + "\n")
        os.replace(tmp, self.path)


def common_comments():
    return [f"openEMS {openems_version()} (Debian package openems), FDTD, PEC mirror at z = 0, "
            f"PML {PML_CELLS} cells at {CLEAR_MM:g} mm from the wire",
            f"Gaussian pulse {F_CENTRE / 1e9:g} GHz +- {F_SPAN / 1e9:g} GHz, end at "
            f"{10 * math.log10(END_CRITERIA):.0f} dB energy",
            f"mesh: graded, aiming at growth {RATIO:g} per cell away from the wire (the "
            f"largest actual ratio is on each mesh's line), largest cell {SMAX_MM:g} mm",
            "run on " + time.strftime("%Y-%m-%d", time.gmtime())]
