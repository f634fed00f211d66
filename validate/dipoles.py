"""docs/fullwave/dipoles.csv: the three centre-fed dipoles; resonance (X = 0) and R there at
three cell sizes and extrapolated to zero cell size.  The feed gap has a fixed length
(fullwave.GAP_MM) on every mesh.  Run with /usr/bin/python3 (Debian's openEMS bindings)."""
import os
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import fullwave as fw  # noqa: E402

DIPOLES = [("d24.3x1.0", 24.3, 1.0), ("d22.5x0.8", 22.5, 0.8), ("d24.0x0.5", 24.0, 0.5)]
ONLY = os.environ.get("DIPOLES_CASES")
CELLS = [float(c) for c in os.environ.get("DIPOLES_CELLS", "0.1,0.05,0.025").split(",")]
OUT = os.path.join(fw.TABLES, "dipoles.csv")


def main():
    comments = fw.common_comments() + [
        f"feed gap {fw.GAP_MM:g} mm (fixed on every mesh, mesh lines at its ends), lumped port "
        f"spanning it over the wire's square cross-section |x|,|y| <= a",
        "resonance: first zero of the input reactance, linear between 2 MHz samples; R there",
        "cell_mm = 0: Richardson extrapolation f0 + c h^p through the three meshes "
        "(first order from the two finest when they are not monotone); R likewise"]
    header = ["case", "length_mm", "wire_diameter_mm", "cell_mm", "resonance_mhz",
              "resistance_ohm"]
    table = fw.Table(OUT, header, comments, key=4)
    for case, length, diameter in DIPOLES:
        if ONLY and case not in ONLY.split(","):
            continue
        done = {float(r[3]): (float(r[4]) * 1e6, float(r[5])) for r in table.rows
                if r[0] == case and float(r[3]) > 0}
        for cell in CELLS:
            if table.find([case, f"{length:g}", f"{diameter:g}", f"{cell:g}"]) is not None:
                continue
            f, z, secs, mesh = fw.fed_dipole(f"{case}-{cell:g}", length, diameter, cell)
            fr, r = fw.zero_crossing(f, z)
            done[cell] = (fr, r)
            table.comment(f"{case} cell {cell:g}: " + fw.describe_mesh(*mesh, cell)
                          + f"; {secs:.0f} s")
            table.add([case, f"{length:g}", f"{diameter:g}", f"{cell:g}", f"{fr / 1e6:.1f}",
                       f"{r:.2f}"])
            print(f"{case} {cell:g} mm: {fr / 1e6:.1f} MHz, {r:.2f} ohm ({secs:.0f} s)",
                  flush=True)
        if len(done) >= 2:
            cells = sorted(done)
            f0, p = fw.richardson(cells, [done[c][0] for c in cells])
            r0, q = fw.richardson(cells, [done[c][1] for c in cells])
            table.comment(f"{case} extrapolation from cells {', '.join(f'{c:g}' for c in cells)}: "
                          f"order {p:.2f} (f), {q:.2f} (R)")
            table.add_last([case, f"{length:g}", f"{diameter:g}", "0", f"{f0 / 1e6:.1f}",
                       f"{r0:.2f}"])


if __name__ == "__main__":
    main()
