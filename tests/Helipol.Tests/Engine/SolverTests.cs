using Helipol.Engine;
using Helipol.Engine.Solve;
using Complex = System.Numerics.Complex;

namespace Helipol.Tests.Engine;

public class SolverTests
{
    // The hand-written LU is only a faster layout of the same algorithm: it must agree with the
    // MathNet.Numerics LU (the reference path) on a real impedance matrix with junctions, loss and ground.
    [Fact]
    public void HandWrittenLuMatchesMathNet()
    {
        var mesh = MeshedModel.Create(InvariantTests.Awkward(), 1.2e9);
        var reference = MomSolver.Solve(mesh, 1.1e9, MathNetLuSolver.Instance, useReferenceFill: false);
        var fast = MomSolver.Solve(mesh, 1.1e9, DenseLuSolver.Instance, useReferenceFill: false);
        Assert.True((reference.InputImpedanceOhm() - fast.InputImpedanceOhm()).Magnitude < 1e-9 * reference.InputImpedanceOhm().Magnitude);
        for (int s = 0; s < reference.Currents.Count; s++)
            Assert.True((reference.Currents[s].EndCurrentA - fast.Currents[s].EndCurrentA).Magnitude < 1e-9 * reference.InputCurrentA().Magnitude);
    }

    // A general (non-symmetric) system with a known solution checks pivoting: the first pivot is zero.
    [Fact]
    public void HandWrittenLuPivots()
    {
        const int n = 9;
        var a = new Complex[n * n];
        var rng = new Random(7);
        for (int i = 0; i < n * n; i++) a[i] = new Complex(rng.NextDouble() - 0.5, rng.NextDouble() - 0.5);
        a[0] = 0;
        var x = Enumerable.Range(0, n).Select(i => new Complex(i + 1, -i)).ToArray();
        var b = new Complex[n];
        for (int i = 0; i < n; i++)
            for (int j = 0; j < n; j++) b[i] += a[i + j * n] * x[j];
        var solved = new Complex[n];
        DenseLuSolver.Instance.Solve((Complex[])a.Clone(), n, b, solved);
        for (int i = 0; i < n; i++) Assert.True((solved[i] - x[i]).Magnitude < 1e-10);
    }
}
