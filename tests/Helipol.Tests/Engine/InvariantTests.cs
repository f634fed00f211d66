using Complex = System.Numerics.Complex;
using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class InvariantTests
{
    /// <summary>Bent wires, a three-way junction, a lossy and a coated branch, a close parasitic element, a load, over ground: exercises every term.</summary>
    internal static WireModel Awkward(GroundPlane ground = GroundPlane.PerfectAtZ0) => new(
        new[]
        {
            new Wire(new Vector3[] { new(0, 0, 0.0), new(0, 0, 0.15), new(0, 0, 0.22) }, 1e-3, PerfectConductor.Instance),
            new Wire(new Vector3[] { new(0, 0, 0.22), new(0.08, 0.02, 0.3), new(0.1, 0.1, 0.32) }, 5e-4, new LossyConductor(1.4e6, 50)),
            new Wire(new Vector3[] { new(0, 0, 0.22), new(-0.1, 0, 0.26) }, 8e-4, PerfectConductor.Instance,
                new DielectricCoating(3, 1.6e-3)),
            new Wire(new Vector3[] { new(0.05, -0.03, 0.05), new(0.05, 0.03, 0.12) }, 1e-3, PerfectConductor.Instance),
            // A parasitic element hugging the vertical wire, as on a polarizer sleeve.
            new Wire(new Vector3[] { new(0.004, 0, 0.06), new(0.0, 0.004, 0.1), new(-0.004, 0, 0.14) }, 5e-4, PerfectConductor.Instance),
        },
        ground,
        new[] { new VoltageSource(new Vector3(0, 0, ground == GroundPlane.None ? 0.1 : 0), 1) },
        new[] { new LumpedLoad(new Vector3(0.05, 0, 0.085), new Complex(40, -30)) });

    // Reciprocity (Harrington, Field Computation by Moment Methods, §1.3; Galerkin testing of a
    // reciprocal operator gives a symmetric matrix). The plain reference fill computes Z_mn and Z_nm
    // separately (observation and source swapped), so symmetry there is a test of the kernel, the
    // image terms and the basis orientation; the residual is quadrature error (about 2e-7 of the
    // largest diagonal entry here), so 1e-5 leaves room without hiding a wrong sign.
    [Theory]
    [InlineData(GroundPlane.PerfectAtZ0)]
    [InlineData(GroundPlane.None)]
    public void ImpedanceMatrixIsSymmetric(GroundPlane ground)
    {
        var mesh = MeshedModel.Create(Awkward(ground), 1.2e9);
        int n = mesh.UnknownCount;
        var z = new Complex[n * n];
        MomSolver.FillMatrix(mesh, 1.2e9, z, useReferenceFill: true);
        double scale = Enumerable.Range(0, n).Max(i => z[i * (n + 1)].Magnitude);
        for (int m = 0; m < n; m++)
            for (int k = m + 1; k < n; k++)
                Assert.True((z[m + k * n] - z[k + m * n]).Magnitude < 1e-5 * scale, $"Z[{m},{k}] = {z[m + k * n]} but Z[{k},{m}] = {z[k + m * n]}");
    }

    // The adaptive fill (distance-dependent order, only p ≤ q) must agree with the plain reference fill
    // (16 × 8 points and singularity subtraction on every pair): entries within 5e-4 of the largest
    // diagonal entry (the Gauss error bounds of InteractionTable.FarOrder), input impedance within 0.1 %.
    [Fact]
    public void AdaptiveFillMatchesReferenceFill()
    {
        var mesh = MeshedModel.Create(Awkward(), 1.2e9);
        int n = mesh.UnknownCount;
        var fast = new Complex[n * n];
        var plain = new Complex[n * n];
        MomSolver.FillMatrix(mesh, 1.2e9, fast, useReferenceFill: false);
        MomSolver.FillMatrix(mesh, 1.2e9, plain, useReferenceFill: true);
        double scale = Enumerable.Range(0, n).Max(i => plain[i * (n + 1)].Magnitude);
        for (int i = 0; i < n * n; i++)
            Assert.True((fast[i] - plain[i]).Magnitude < 5e-4 * scale, $"entry {i}: {fast[i]} vs {plain[i]}");
        var zFast = MomSolver.Solve(mesh, 1.2e9, Helipol.Engine.Solve.MathNetLuSolver.Instance, useReferenceFill: false).InputImpedanceOhm();
        var zPlain = MomSolver.Solve(mesh, 1.2e9, Helipol.Engine.Solve.MathNetLuSolver.Instance, useReferenceFill: true).InputImpedanceOhm();
        Assert.True((zFast - zPlain).Magnitude < 1e-3 * zPlain.Magnitude, $"{zFast} vs {zPlain}");
    }

    // Conservation of energy (design note, §3): input power = far-field-integrated radiated power +
    // ohmic loss (skin effect and resistive loads) within 1 %.
    [Theory]
    [InlineData(GroundPlane.PerfectAtZ0)]
    [InlineData(GroundPlane.None)]
    public void InputPowerIsRadiatedPlusOhmic(GroundPlane ground)
    {
        var s = Antennas.Solve(Awkward(ground), 1.2e9);
        Assert.True(s.OhmicLossW > 0.01 * s.InputPowerW, "the model must actually lose power for this check to mean anything");
        Assert.Equal(1.0, (s.RadiatedPowerW + s.OhmicLossW) / s.InputPowerW, 0.01);
        Assert.Equal(s.RadiatedPowerW / (s.RadiatedPowerW + s.OhmicLossW), s.Efficiency, 12);
    }

    // Convergence (Harrington §4; a consistent MoM converges as segments shrink): in the converged
    // range (80 → 160 segments per λ on a thin half-wave dipole) the impedance changes by less than 1 %.
    [Fact]
    public void ImpedanceSettlesWhenSegmentationDoubles()
    {
        var coarse = Antennas.Solve(Antennas.Dipole(0.5, 1e-4), options: new SegmentationOptions(80)).InputImpedanceOhm();
        var fine = Antennas.Solve(Antennas.Dipole(0.5, 1e-4), options: new SegmentationOptions(160)).InputImpedanceOhm();
        var coarser = Antennas.Solve(Antennas.Dipole(0.5, 1e-4), options: new SegmentationOptions(40)).InputImpedanceOhm();
        Assert.True((fine - coarse).Magnitude < 0.01 * fine.Magnitude, $"{coarse} → {fine}");
        Assert.True((fine - coarse).Magnitude < (coarse - coarser).Magnitude, "the change must shrink as segmentation doubles");
    }

    // Kirchhoff's current law at a junction, and symmetry: a feed wire that splits into two mirror-image
    // arms carries equal arm currents that add up to the feed current.
    [Fact]
    public void JunctionSplitsCurrentEvenly()
    {
        var model = new WireModel(
            new[]
            {
                new Wire(new Vector3[] { new(0, 0, 0), new(0, 0, 0.1) }, 1e-3, PerfectConductor.Instance),
                new Wire(new Vector3[] { new(0, 0, 0.1), new(0.1, 0, 0.2) }, 1e-3, PerfectConductor.Instance),
                new Wire(new Vector3[] { new(0, 0, 0.1), new(-0.1, 0, 0.2) }, 1e-3, PerfectConductor.Instance),
            },
            GroundPlane.PerfectAtZ0, new[] { new VoltageSource(new Vector3(0, 0, 0), 1) });
        var s = Antennas.Solve(model);
        var feedTop = s.Currents.Last(c => c.WireIndex == 0).EndCurrentA;
        var armA = s.Currents.First(c => c.WireIndex == 1).StartCurrentA;
        var armB = s.Currents.First(c => c.WireIndex == 2).StartCurrentA;
        Assert.True((armA - armB).Magnitude < 1e-6 * armA.Magnitude, $"{armA} vs {armB}");
        Assert.True((armA + armB - feedTop).Magnitude < 1e-9 * feedTop.Magnitude);
        Assert.True(feedTop.Magnitude > 0.1 * s.InputCurrentA().Magnitude);
        // Free ends carry no current.
        Assert.Equal(Complex.Zero, s.Currents.Last(c => c.WireIndex == 1).EndCurrentA);
    }
}
