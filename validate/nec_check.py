"""Cross-check of a fed dipole against NEC-2 (Debian `nec2c`): the resonance (X = 0) and R
there, at a few segment counts, for comparison with docs/fullwave/dipoles.csv.  NEC-2 feeds
with a voltage across one segment (its delta-gap source), so the segment count whose segment
is closest to the FDTD feed gap is the like-for-like one.  Prints a small table."""
import math
import os
import re
import subprocess
import sys
import tempfile

import numpy as np

CASES = {"d24.3x1.0": (24.3, 1.0), "d22.5x0.8": (22.5, 0.8), "d24.0x0.5": (24.0, 0.5)}


def run_nec2c(deck):
    """nec2c's printed output for a deck, and the frequencies (MHz) it ran, in order."""
    with tempfile.TemporaryDirectory() as tmp:
        inp, out = os.path.join(tmp, "deck.nec"), os.path.join(tmp, "deck.out")
        with open(inp, "w") as fh:
            fh.write(deck)
        subprocess.run(["nec2c", "-i", inp, "-o", out], check=True, capture_output=True)
        text = open(out).read()
    return text, [float(m) for m in re.findall(r"FREQUENCY\s*[:=]\s*([0-9.E+-]+)\s*MHZ", text, re.I)]


def impedances(length_mm, diameter_mm, segments, f_lo=5000.0, step=5.0, n=321):
    """(f MHz, R, X) from nec2c for the centre-fed straight wire."""
    h = length_mm / 2000.0
    deck = (f"CM straight centre-fed dipole\nCE\n"
            f"GW 1 {segments} 0 0 {-h:.6f} 0 0 {h:.6f} {diameter_mm / 2000.0:.6f}\nGE 0\n"
            f"EX 0 1 {segments // 2 + 1} 0 1 0\nFR 0 {n} 0 0 {f_lo:g} {step:g}\nXQ\nEN\n")
    text, freqs = run_nec2c(deck)
    zs = re.findall(r"ANTENNA INPUT PARAMETERS.*?\n.*?\n.*?\n\s*\d+\s+\d+\s+(\S+)\s+(\S+)\s+"
                    r"(\S+)\s+(\S+)\s+(\S+)\s+(\S+)", text, re.S)
    return [(f, float(z[4]), float(z[5])) for f, z in zip(freqs, zs)]


def element_peak(length_mm, diameter_mm, segments, f_lo=5300.0, step=5.0, n=201):
    """Frequency (MHz) where the centre current of the unfed wire, lit broadside by a plane wave
    polarized along it (NEC-2's EX 1 source, incidence theta = 90 deg), peaks."""
    h = length_mm / 2000.0
    deck = (f"CM straight unfed wire, plane wave\nCE\n"
            f"GW 1 {segments} 0 0 {-h:.6f} 0 0 {h:.6f} {diameter_mm / 2000.0:.6f}\nGE 0\n"
            f"EX 1 1 1 0 90 0 0\nFR 0 {n} 0 0 {f_lo:g} {step:g}\nXQ\nEN\n")
    text, freqs = run_nec2c(deck)
    centre = segments // 2 + 1
    row = rf"\n\s+{centre}\s+1\s+\S+\s+\S+\s+\S+\s+\S+\s+(\S+)\s+(\S+)"
    mags = np.array([math.hypot(float(a), float(b)) for a, b in re.findall(row, text)])
    # NEC-2 prints five digits, which leaves the top of the broad peak flat: fit a parabola
    # by least squares over the samples within 2 % of the largest.
    f = np.array(freqs)
    near = mags >= 0.98 * mags.max()
    c2, c1, _ = np.polyfit(f[near], mags[near], 2)
    return -c1 / (2 * c2)


def resonance(rows):
    for (f0, r0, x0), (f1, r1, x1) in zip(rows[:-1], rows[1:]):
        if x0 < 0.0 <= x1:
            w = -x0 / (x1 - x0)
            return f0 + w * (f1 - f0), r0 + w * (r1 - r0)
    raise RuntimeError("no reactance zero")


def main():
    cases = sys.argv[1:] or list(CASES)
    print("case,segments,segment_mm,resonance_mhz,resistance_ohm")
    for case in cases:
        length, diameter = CASES[case]
        for seg in (11, 15, 21, 25, 31, 41, 47, 61, 81):
            # NEC-2's thin-wire kernel wants segments of at least about 2 radii (its manual's
            # lower bound for the reduced kernel is 8 radii for 1 % accuracy)
            if length / seg < diameter:
                continue
            f, r = resonance(impedances(length, diameter, seg))
            print(f"{case},{seg},{length / seg:.3f},{f:.1f},{r:.2f}")
    print("element,segments,segment_mm,resonance_mhz")
    for seg in (11, 15, 21, 25):
        print(f"e22.5x0.8,{seg},{22.5 / seg:.3f},{element_peak(22.5, 0.8, seg):.1f}")


if __name__ == "__main__":
    main()
