using Helipol.Design;
using Helipol.Engine;
using Helipol.Model;
using Xunit.Abstractions;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// Where in frequency the polarizer's axial ratio is best, engine against NEC-2 (Debian nec2c 1.3,
/// standard and extended kernels), the whole polarizer in air as perfect conductors (NEC-2 has no
/// coating model). The figure a builder acts on is the frequency of best AR, so it is compared
/// directly: the mean horizon AR (dB, every 15° of azimuth) over a sweep, its minimum refined by a
/// parabola through the three lowest samples. The project's aim: within 1.5 %.
/// </summary>
public class BestAxialRatioFrequencyTests(ITestOutputHelper output)
{
    private const double WhipLengthM = 24.3e-3, WhipRadiusM = 0.5e-3, FormerDiameterM = 28e-3, WireRadiusM = 0.4e-3;

    private static WireModel Model(int count, double lengthMm, double riseMm, double topHz) =>
        PolarizerWires.Build(new PolarizerBuild(WhipKind.Dipole, WhipLengthM, WhipRadiusM, FormerDiameterM, 0, Winding.Left,
            PolarizerBuild.Uniform(count, lengthMm * 1e-3, riseMm * 1e-3), WireRadiusM, null, 1, Surroundings.None(WireRadiusM)), topHz);

    private static double MeanHorizonArDb(IEnumerable<double> arDb) => arDb.Average();

    // Layouts near the bare-wire optimum (3 and 5 × 22.1 mm at 16.6 mm rise, the layout of
    // Nec2PolarizerTests) and a shorter one whose best AR falls higher in frequency.
    [SkippableTheory]
    [InlineData(3, 22.1, 16.6)]
    [InlineData(5, 22.1, 16.6)]
    [InlineData(4, 20.5, 15.0)]
    public void BestAxialRatioFallsAtTheSameFrequency(int count, double lengthMm, double riseMm)
    {
        Nec2c.Require();
        const double lo = 5.2e9, hi = 6.6e9;
        const int steps = 29;
        var freqs = Enumerable.Range(0, steps).Select(i => lo + (hi - lo) * i / (steps - 1)).ToArray();
        var model = Model(count, lengthMm, riseMm, hi);
        var mesh = MeshedModel.Create(model, hi);
        var phis = Enumerable.Range(0, 24).Select(i => i * 15.0).ToArray();
        var engine = freqs.Select(f =>
        {
            var s = MomSolver.Solve(mesh, f);
            return MeanHorizonArDb(phis.Select(p => s.GainAt(Math.PI / 2, p * Math.PI / 180).AxialRatioDb));
        }).ToArray();
        double[] Nec(bool extended) => freqs.Select(f =>
        {
            var deck = Nec2Deck.Write(model, f, [Nec2Cut.Horizon(15)]);
            if (extended) deck = deck.Replace("GE 0\n", "GE 0\nEK\n");
            return MeanHorizonArDb(Nec2c.Run(deck).Pattern.Select(p => p.AxialRatioDb));
        }).ToArray();
        double fEngine = Minimum(freqs, engine), fNec = Minimum(freqs, Nec(false)), fNecEk = Minimum(freqs, Nec(true));
        output.WriteLine(FormattableString.Invariant(
            $"{count} × {lengthMm} mm, {riseMm} mm rise: best AR at engine {fEngine / 1e6:0} MHz ({engine.Min():0.0} dB), NEC-2 {fNec / 1e6:0} MHz, NEC-2 EK {fNecEk / 1e6:0} MHz; engine − NEC-2 EK {100 * (fEngine - fNecEk) / fNecEk:+0.00;-0.00} %"));
        Assert.InRange(Math.Abs(fEngine - fNecEk) / fNecEk, 0, 0.015);
        Assert.InRange(Math.Abs(fEngine - fNec) / fNec, 0, 0.015);
    }

    private static double Minimum(double[] f, double[] y)
    {
        int i = Array.IndexOf(y, y.Min());
        if (i == 0 || i == y.Length - 1) throw new InvalidOperationException("best AR at the sweep's edge: widen it");
        double y0 = y[i - 1], y1 = y[i], y2 = y[i + 1];
        double shift = 0.5 * (y0 - y2) / (y0 - 2 * y1 + y2);
        return f[i] + shift * (f[1] - f[0]);
    }
}
