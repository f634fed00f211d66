"""docs/fullwave/loading.csv: resonance of the 24.0 mm x 0.5 mm dipole bare and in each
dielectric surrounding of docs/fullwave/README.md, at two cell sizes; the shift is against
`bare` on the same mesh.  Run with /usr/bin/python3 (Debian's openEMS bindings)."""
import os
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import fullwave as fw  # noqa: E402

LENGTH, DIAMETER = 24.0, 0.5
CASES = ["bare", "sleeve", "foam", "tape-hug", "tape-tent-0.5", "tape-tent-1.0", "tape-hug-glue"]
CASES = [c for c in os.environ.get("LOADING_CASES", ",".join(CASES)).split(",")]
CELLS = [float(c) for c in os.environ.get("LOADING_CELLS", "0.05,0.025").split(",")]
OUT = os.path.join(fw.TABLES, "loading.csv")


def main():
    a = DIAMETER / 2
    comments = fw.common_comments() + [
        f"feed gap {fw.GAP_MM:g} mm (fixed on every mesh), lumped port over the wire's "
        f"cross-section; tape and sleeve run the wire's length, foam {fw.FOAM_OVERHANG:g} mm "
        f"past each end",
        "resonance: first zero of the input reactance, linear between 2 MHz samples"]
    table = fw.Table(OUT, ["case", "cell_mm", "resonance_mhz", "shift_percent"], comments)
    for cell in CELLS:
        mesh = fw.loading_mesh(cell, a, LENGTH)
        table.comment(f"cell {cell:g}: " + fw.describe_mesh(*mesh, cell))
        bare = None
        for case in CASES:
            old = table.find([case, f"{cell:g}"])
            if old is not None:
                if case == "bare":
                    bare = float(old[2]) * 1e6
                continue
            f, z, secs, _ = fw.fed_dipole(f"loading-{case}-{cell:g}", LENGTH, DIAMETER, cell,
                                          surroundings=case, mesh=mesh)
            fr, _ = fw.zero_crossing(f, z)
            if case == "bare":
                bare = fr
            shift = 100.0 * (fr - bare) / bare
            table.comment(f"{case} at {cell:g} mm: {secs:.0f} s")
            table.add([case, f"{cell:g}", f"{fr / 1e6:.1f}", f"{shift:.2f}"])
            print(f"{case} {cell:g} mm: {fr / 1e6:.1f} MHz {shift:+.2f} % ({secs:.0f} s)",
                  flush=True)


if __name__ == "__main__":
    main()
