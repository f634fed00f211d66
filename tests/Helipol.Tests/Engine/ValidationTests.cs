using Complex = System.Numerics.Complex;
using Helipol.Engine;

namespace Helipol.Tests.Engine;

// Refusals before any solve (thin-wire validity: segment longer than about 2 radii with the tube kernel, wires apart by more
// than their radii — Harrington, Field Computation by Moment Methods, §4; common practice, no source
// for the exact thresholds).
public class ValidationTests
{
    private static readonly Wire Good = new(new Vector3[] { new(0, 0, -0.25), new(0, 0, 0), new(0, 0, 0.25) }, 1e-3, PerfectConductor.Instance);
    private static readonly VoltageSource Feed = new(new Vector3(0, 0, 0), 1);

    private static string Refusal(WireModel model, double f = 3e8, SegmentationOptions? o = null) =>
        Assert.Throws<ModelException>(() => MeshedModel.Create(model, f, o)).Message;

    private static WireModel With(params Wire[] wires) => new(wires, GroundPlane.None, new[] { Feed });

    [Fact]
    public void RefusesNonPositiveRadius() =>
        Assert.Contains("radius", Refusal(With(Good with { RadiusM = 0 })));

    [Fact]
    public void RefusesNaNCoordinates() =>
        Assert.Contains("points[1]", Refusal(With(Good with { PointsM = new Vector3[] { new(0, 0, -0.25), new(0, double.NaN, 0), new(0, 0, 0.25) } })));

    // The last edge is 1 mm of 1 mm-radius wire, 1.5 mm with its end cap (a/2): under two radii.
    [Fact]
    public void RefusesEdgeShorterThanTwoRadii() =>
        Assert.Contains("2 wire radii", Refusal(With(Good with { PointsM = new Vector3[] { new(0, 0, -0.25), new(0, 0, 0), new(0, 0, 0.001) } })));

    [Fact]
    public void RefusesCrossingWires()
    {
        var other = Wire.Straight(new Vector3(-0.2, 0, 0.1), new Vector3(0.2, 0, 0.1), 1e-3);
        Assert.Contains("touching or crossing", Refusal(With(Good, other)));
    }

    [Fact]
    public void RefusesParallelWiresCloserThanTheirRadii()
    {
        var other = Wire.Straight(new Vector3(0.0015, 0, -0.2), new Vector3(0.0015, 0, 0.2), 1e-3);
        Assert.Contains("touching or crossing", Refusal(With(Good, other)));
    }

    [Fact]
    public void RefusesSourceOffTheWire() =>
        Assert.Contains("allowed a point on a wire", Refusal(new WireModel(new[] { Good }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0.1, 0, 0), 1) })));

    [Fact]
    public void RefusesSourceOnAFreeEnd() =>
        Assert.Contains("free wire end", Refusal(new WireModel(new[] { Good }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, 0.25), 1) })));

    [Fact]
    public void RefusesSourceAtAJunction()
    {
        var branch = Wire.Straight(new Vector3(0, 0, 0), new Vector3(0.2, 0, 0.1), 1e-3);
        Assert.Contains("junction", Refusal(With(Good, branch)));
    }

    [Fact]
    public void RefusesWireBelowGround() =>
        Assert.Contains("below the ground", Refusal(Antennas.Dipole(0.5, 1e-3) with { Ground = GroundPlane.PerfectAtZ0 }));

    [Fact]
    public void RefusesNonFiniteVoltage() =>
        Assert.Contains("sources[0]", Refusal(new WireModel(new[] { Good }, GroundPlane.None, new[] { new VoltageSource(new Vector3(0, 0, 0), new Complex(double.NaN, 0)) })));

    [Fact]
    public void RefusesCoatingInsideTheWire() =>
        Assert.Contains("coating.outer_radius", Refusal(With(Good with { Coating = new DielectricCoating(3, 5e-4) })));

    [Fact]
    public void RefusesFrequencyAboveTheSegmentation()
    {
        var mesh = MeshedModel.Create(Antennas.Dipole(0.5, 1e-3), 3e8);
        Assert.Contains("frequency", Assert.Throws<ModelException>(() => MomSolver.Solve(mesh, 4e8)).Message);
        Assert.Contains("frequency", Assert.Throws<ModelException>(() => MomSolver.Solve(mesh, double.NaN)).Message);
    }

    [Fact]
    public void RefusesWireTooThickForTheFrequency() =>
        Assert.Contains("too thick", Refusal(Antennas.Dipole(3, 0.05), 3e8));
}

public class ResultGuardTests
{
    // NaN never leaves the engine: a non-finite direction is refused rather than answered with NaN.
    [Fact]
    public void RefusesNonFiniteDirection()
    {
        var s = Antennas.Solve(Antennas.Dipole(0.5, 1e-3));
        Assert.Throws<ArgumentOutOfRangeException>(() => s.GainAt(double.NaN, 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => s.FarFieldAt(0, double.PositiveInfinity));
    }
}
