using System.Diagnostics;
using System.Globalization;
using Helipol.Design.Loading;

namespace Helipol.Bench;

/// <summary>
/// The cross-section field solve behind the element loading: one cold solve (the cache emptied
/// first) and one cached look-up, for the tape-on-foam section of docs/fullwave/README.md.
/// </summary>
public static class LoadingBench
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Run(int runs = 5)
    {
        var section = new ElementCrossSection(0.25e-3, 1.05, 4e-3, 5e-3, null, 0, 1, 0, 3.0, 0.15e-3, null);
        AddedInductance.ShapeFactor(section); // JIT warm-up
        var cold = new List<double>();
        var cached = new List<double>();
        for (int r = 0; r < runs; r++)
        {
            AddedInductance.ClearCache();
            var sw = Stopwatch.StartNew();
            AddedInductance.ShapeFactor(section);
            cold.Add(sw.Elapsed.TotalMilliseconds);
            sw.Restart();
            for (int k = 0; k < 1000; k++) AddedInductance.ShapeFactor(section);
            cached.Add(sw.Elapsed.TotalMilliseconds * 1000 / 1000);
        }
        cold.Sort();
        cached.Sort();
        var grid = new LogPolarGrid(section.WireRadiusM, AddedInductance.DefaultAngularCells);
        Console.WriteLine(string.Create(Inv, $"Element loading, cross-section field solve ({grid.RadialCells} × {grid.AngularCells} cells; the vacuum solve is shared): cold {cold[runs / 2]:0.0} ms (min {cold[0]:0.0}), cached {cached[runs / 2]:0.00} µs per look-up (median of {runs})"));
        WrapSpread(section);
        Console.WriteLine();
    }

    /// <summary>
    /// The loading's share of a Monte Carlo: 500 wrap thicknesses uniform within ±30 % (the default
    /// spread), read through the interpolation between solved thicknesses, from a cold cache.
    /// </summary>
    private static void WrapSpread(ElementCrossSection section)
    {
        var s = new Helipol.Design.Surroundings(section, 1);
        AddedInductance.ClearCache();
        var rng = new Random(1);
        var sw = Stopwatch.StartNew();
        double sum = 0;
        for (int b = 0; b < 500; b++) sum += s.WithWrapScaled(1 + 0.3 * (2 * rng.NextDouble() - 1)).ShapeFactor;
        double ms = sw.Elapsed.TotalMilliseconds;
        Console.WriteLine(string.Create(Inv, $"Element loading, Monte Carlo wrap spread (500 builds, ±30 %, cold cache): {ms:0} ms, {AddedInductance.CachedCount} sections solved (mean S {sum / 500:0.0000})"));
    }
}
