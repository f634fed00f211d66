using Helipol.Engine;
using Xunit.Abstractions;

namespace Helipol.Tests.Engine.Nec2Comparison;

/// <summary>
/// Broadside resonance of lone straight wires (<see cref="LoneElement"/>), the engine at its default
/// segmentation against NEC-2 with the extended thin-wire kernel (Debian nec2c 1.3, EK card; the NEC-2
/// user's guide recommends it for thick wires), whose end condition carries the charge on flat caps.
/// The wires are the full-wave reference cases of docs/fullwave/README.md; the project's own FDTD
/// table for the first (docs/fullwave/element.csv, 5816.8 MHz extrapolated) is checked in
/// Engine/FullWave/FullWaveTableTests.
/// Observed, engine at default segmentation (30 per λ, end caps, tube kernel) vs NEC-2 EK at 21
/// segments: 22.5 × 0.8 mm 5787.8 vs 5792.4 MHz; 24.3 × 1.0 mm 5298.8 vs 5320.9 MHz; 24.0 × 0.5 mm
/// 5582.5 vs 5572.1 MHz. Before (20 per λ, reduced kernel only, no end caps) the first was 5888 MHz.
/// </summary>
public class LoneElementTests(ITestOutputHelper output)
{
    [SkippableTheory]
    [InlineData(22.5, 0.8, 5.5e9, 6.1e9)]
    [InlineData(24.3, 1.0, 5.0e9, 5.7e9)]
    [InlineData(24.0, 0.5, 5.3e9, 5.9e9)]
    public void ResonanceAtDefaultSegmentationIsWithinHalfAPercentOfNec2ExtendedKernel(double lengthMm, double diameterMm, double loHz, double hiHz)
    {
        Nec2c.Require();
        double l = lengthMm * 1e-3, a = diameterMm * 0.5e-3;
        double engine = LoneElement.EngineResonanceHz(l, a, loHz, hiHz);
        double nec = LoneElement.Nec2ResonanceHz(l, a, 21, loHz, hiHz, 10e6);
        output.WriteLine(FormattableString.Invariant($"{lengthMm} × {diameterMm} mm: engine {engine / 1e6:0.0} MHz, NEC-2 EK {nec / 1e6:0.0} MHz"));
        Assert.InRange(engine / nec - 1, -0.005, 0.005);
    }

    // NEC-2's extended kernel is itself converged here: 11, 21 and 41 segments within 0.1 % (the
    // check's finding), so the comparison above does not hang on NEC's segmentation.
    [SkippableFact]
    public void Nec2ExtendedKernelIsConvergedOnTheReferenceWire()
    {
        Nec2c.Require();
        var f = new[] { 11, 21, 41 }.Select(n => LoneElement.Nec2ResonanceHz(22.5e-3, 0.4e-3, n, 5.5e9, 6.1e9, 10e6)).ToArray();
        Assert.InRange(f.Max() / f.Min() - 1, 0, 0.002);
    }

    // Convergence with segmentation (the tube kernel keeps the system well posed as segments shrink below
    // the radius). An open tube (no cap) isolates the kernel: from 10 to about 110 segments (2 down to
    // 0.2 radii long) the resonance falls by successively smaller steps, the last doubling moving it
    // under 0.2 %, and it stays within 1 % of NEC-2's value, which includes the cap and so must lie below
    // the open tube's. Observed 5908, 5867, 5843, 5828, 5821 MHz at 20, 40, 80, 160, 300 per λ.
    // With the flat cap (a/2 extension) the resonance falls further as the extension is resolved, the
    // known weakness of the equal-area correction for wires this thick (Heldring, Úbeda and Rius,
    // Electronics Letters 2005): 5810, 5788, 5770, 5747, 5737, 5726 MHz at 20, 30, 40, 80, 160, 300 per λ,
    // so the default density is held to the references above and the fine meshes within 1.5 % here.
    [SkippableFact]
    public void ResonanceConvergesWithSegmentation()
    {
        Nec2c.Require();
        double nec = LoneElement.Nec2ResonanceHz(22.5e-3, 0.4e-3, 21, 5.5e9, 6.1e9, 10e6);
        var densities = new[] { (20.0, 2.0), (40.0, 1.0), (80.0, 0.5), (160.0, 0.25), (300.0, 0.1) };
        double Open(SegmentationOptions o) => LoneElement.EngineResonanceHz(22.5e-3, 0.4e-3, 5.5e9, 6.1e9, o, WireEnds.Open);
        var open = densities.Select(d => Open(new SegmentationOptions(d.Item1, 3, d.Item2))).ToArray();
        output.WriteLine(string.Join(", ", open.Select(f => FormattableString.Invariant($"{f / 1e6:0.0}"))));
        for (int i = 1; i < open.Length; i++) Assert.True(open[i] < open[i - 1], "the open tube's resonance falls as segments shorten");
        for (int i = 2; i < open.Length; i++)
            Assert.True(open[i - 1] - open[i] < open[i - 2] - open[i - 1] + 2e6, "steps shrink (within the 2 MHz noise of the search)");
        Assert.InRange(open[^2] / open[^1] - 1, 0, 0.002);
        Assert.InRange(open[^1] / nec - 1, 0, 0.01);
        var flat = densities.Select(d => LoneElement.EngineResonanceHz(22.5e-3, 0.4e-3, 5.5e9, 6.1e9, new SegmentationOptions(d.Item1, 3, d.Item2))).ToArray();
        Assert.All(flat, f => Assert.InRange(f / nec - 1, -0.015, 0.005));
    }
}
