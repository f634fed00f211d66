"""docs/fullwave/element.csv: the lone 22.5 mm x 0.8 mm element lit broadside by a plane wave;
resonance = peak of the centre current per unit incident field, at three cell sizes and
extrapolated to zero cell size.  Run with /usr/bin/python3 (Debian's openEMS bindings)."""
import os
import sys

import numpy as np

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import fullwave as fw  # noqa: E402

CASE, LENGTH, DIAMETER = "e22.5x0.8", 22.5, 0.8
CELLS = [float(c) for c in os.environ.get("ELEMENT_CELLS", "0.1,0.05,0.025").split(",")]
OUT = os.path.join(fw.TABLES, "element.csv")


def main():
    comments = fw.common_comments() + [
        "plane wave along +y, E along z, total-field box |x|,|y| <= 3 mm, z <= L/2 + 3 mm; "
        "resonance: peak of |I_centre / E_inc| (2 MHz samples, parabolic refinement)",
        "cell_mm = 0: Richardson extrapolation f0 + c h^p through the three meshes "
        "(first order from the two finest when they are not monotone)"]
    table = fw.Table(OUT, ["case", "length_mm", "wire_diameter_mm", "cell_mm", "resonance_mhz"],
                     comments, key=4)
    done = {float(r[3]): float(r[4]) * 1e6 for r in table.rows if float(r[3]) > 0}
    for cell in CELLS:
        if table.find([CASE, f"{LENGTH:g}", f"{DIAMETER:g}", f"{cell:g}"]) is not None:
            continue
        f, y, secs, mesh = fw.lit_element(f"element-{cell:g}", LENGTH, DIAMETER, cell)
        fr = fw.peak(f, np.abs(y))
        done[cell] = fr
        table.comment(f"cell {cell:g}: " + fw.describe_mesh(*mesh, cell) + f"; {secs:.0f} s")
        table.add([CASE, f"{LENGTH:g}", f"{DIAMETER:g}", f"{cell:g}", f"{fr / 1e6:.1f}"])
        print(f"{CASE} {cell:g} mm: {fr / 1e6:.1f} MHz ({secs:.0f} s)", flush=True)
    if len(done) >= 2:
        cells = sorted(done)
        f0, p = fw.richardson(cells, [done[c] for c in cells])
        table.comment(f"extrapolation from cells {', '.join(f'{c:g}' for c in cells)}: order p = {p:.2f}")
        table.add_last([CASE, f"{LENGTH:g}", f"{DIAMETER:g}", "0", f"{f0 / 1e6:.1f}"])
        print(f"{CASE} extrapolated: {f0 / 1e6:.1f} MHz (p = {p:.2f})", flush=True)


if __name__ == "__main__":
    main()
