using Helipol.Design;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Tests.Design;

/// <summary>
/// The wires follow the geometry convention of the design file (README, "Geometry convention"):
/// axis radius outer_diameter/2 + wire_diameter/2, element k starting at 360°·k/N, arc angle
/// sqrt(L² − h²)/R, centred at centre_height, right = azimuth grows with height. The checks
/// recompute each rule from the stated formula, independently of the builder.
/// </summary>
public class GeometryConventionTests
{
    private static readonly PolarizerDesign Practice = DesignFiles.Load("practice-foam-tape");

    [Fact]
    public void ElementsStartAtEvenAzimuthsOnTheFormerSurfaceAndClimbTheRise()
    {
        var build = PolarizerBuild.From(Practice, 5, 16e-3, 12.7e-3, 28e-3, Winding.Right, 1);
        var model = PolarizerWires.Build(build, 5.8e9);
        Assert.Equal(6, model.Wires.Count);
        double radius = 14e-3 + 0.4e-3;
        for (int k = 0; k < 5; k++)
        {
            var pts = model.Wires[k + 1].PointsM;
            var first = pts[0];
            var last = pts[^1];
            Assert.Equal(radius, Math.Sqrt(first.X * first.X + first.Y * first.Y), 12);
            Assert.Equal(2 * Math.PI * k / 5, Wrap(Math.Atan2(first.Y, first.X)), 9);
            Assert.Equal(-12.7e-3 / 2, first.Z, 12);
            Assert.Equal(12.7e-3 / 2, last.Z, 12);
            double arc = Math.Sqrt(16e-3 * 16e-3 - 12.7e-3 * 12.7e-3) / radius;
            Assert.Equal(Wrap(2 * Math.PI * k / 5 + arc), Wrap(Math.Atan2(last.Y, last.X)), 9);
            // The polyline follows the helix: its length is the wire length less the chord shortfall,
            // R·α²/24 per edge at most (sagitta geometry), far below a tenth of a millimetre.
            double length = 0;
            for (int i = 1; i < pts.Count; i++) length += Vector3.Distance(pts[i], pts[i - 1]);
            Assert.InRange(16e-3 - length, 0, 0.05e-3);
        }
    }

    [Fact]
    public void RightWindingClimbsWithAzimuthAndLeftWindingMirrorsIt()
    {
        var right = PolarizerWires.Build(PolarizerBuild.From(Practice, 3, 16e-3, 12.7e-3, 28e-3, Winding.Right, 1), 5.8e9);
        var left = PolarizerWires.Build(PolarizerBuild.From(Practice, 3, 16e-3, 12.7e-3, 28e-3, Winding.Left, 1), 5.8e9);
        var r = right.Wires[1].PointsM;
        var l = left.Wires[1].PointsM;
        Assert.True(Math.Atan2(r[1].Y, r[1].X) > 0 && r[1].Z > r[0].Z);
        Assert.True(Math.Atan2(l[1].Y, l[1].X) < 0 && l[1].Z > l[0].Z);
        for (int i = 0; i < r.Count; i++)
        {
            Assert.Equal(r[i].X, l[i].X, 12);
            Assert.Equal(-r[i].Y, l[i].Y, 12);
            Assert.Equal(r[i].Z, l[i].Z, 12);
        }
    }

    [Fact]
    public void DipoleIsCentredAndFedAtZeroAndMonopoleStandsOnTheGround()
    {
        var dipole = PolarizerWires.BareWhip(WhipKind.Dipole, 24e-3, 0.5e-3);
        Assert.Equal(GroundPlane.None, dipole.Ground);
        Assert.Equal(-12e-3, dipole.Wires[0].PointsM[0].Z, 12);
        Assert.Equal(12e-3, dipole.Wires[0].PointsM[^1].Z, 12);
        Assert.Equal(new Vector3(0, 0, 0), dipole.Sources[0].AtM);
        var monopole = PolarizerWires.BareWhip(WhipKind.Monopole, 56e-3, 1e-3);
        Assert.Equal(GroundPlane.PerfectAtZ0, monopole.Ground);
        Assert.Equal(0, monopole.Wires[0].PointsM[0].Z);
        Assert.Equal(56e-3, monopole.Wires[0].PointsM[^1].Z, 12);
    }

    [Fact]
    public void PecWireAirFormerAndNoWrapGiveNoLossAndNoDielectric()
    {
        var design = DesignFiles.Load("pec-air-search");
        var model = PolarizerWires.Build(PolarizerBuild.From(design, 3, 20e-3, 12e-3, 28e-3, Winding.Left, CoatingCalibration.DefaultFactor), 5.8e9);
        Assert.All(model.Wires, w => Assert.IsType<PerfectConductor>(w.Conductor));
        Assert.All(model.Wires, w => Assert.Null(w.Coating));
        // Invariant of the engine: with no loss, input power = radiated power (Poynting; design.md §3).
        var solution = MomSolver.Solve(MeshedModel.Create(model, 5.8e9), 5.8e9);
        Assert.Equal(1.0, solution.Efficiency, 9);
    }

    private static double Wrap(double a) => ((a % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
}
