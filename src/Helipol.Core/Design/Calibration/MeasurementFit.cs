using Helipol.Model;
using Complex = System.Numerics.Complex;

namespace Helipol.Design;

/// <summary>The measurements a builder hands to <c>helipol calibrate</c>, already read.</summary>
/// <param name="Fitted">a reflection sweep of the whip with the polarizer fitted</param>
/// <param name="Bare">the same whip without it: then the change between the two is fitted</param>
/// <param name="Spin">axial ratios from a spin test</param>
/// <param name="ContrastDb">the winding contrast (right against wrong winding), dB</param>
public sealed record Measurements(ReflectionSweep? Fitted, ReflectionSweep? Bare, IReadOnlyList<SpinPoint>? Spin, double? ContrastDb, double ContrastFrequencyHz);

/// <summary>The fitted factor with its range, the residual and the added inductance it means.</summary>
public sealed record MeasurementFitResult(double Factor, double FactorLow, double FactorHigh, double Residual, double AddedInductanceHPerM, int Readings);

/// <summary>
/// Least-squares fit of the loading factor (a multiplier on the field-solved added inductance) to
/// every measurement given, over 0.3-5 on a log scale: a scan of 25 factors, then golden-section
/// refinement around the best (Press et al., Numerical Recipes, 3rd ed., §10.2).
///
/// <para>Residuals, each made dimensionless so the kinds can be summed: a reflection reading
/// contributes |S11,measured − S11,model| (or, with a bare sweep, the difference of the changes
/// (S11,fitted − S11,bare) measured and modelled, so the whip's own modelling error, its cover and
/// its feed, cancel); a spin reading (AR_measured − AR_model)/3 dB; the winding contrast
/// (measured − model)/3 dB. The 3 dB is a stated scale (a reading of a hobby spin test is good
/// to a dB or two), not a measured one. The uncertainty range holds the factors whose sum of
/// squares lies within one residual variance of the minimum (Δχ² = 1 with σ² estimated from the
/// fit's own residual, as for a one-parameter least-squares fit, Numerical Recipes §15.6).</para>
/// </summary>
public static class MeasurementFit
{
    public const double MinimumFactor = 0.3, MaximumFactor = 5;
    private const double DbScale = 3;

    /// <summary>Frequencies the model can answer for this design: ±50 % of the band centre (the mesh density is chosen for the band; far outside it the whip is another antenna).</summary>
    public static (double Low, double High) SolvableBandHz(PolarizerDesign d) => (0.5 * d.Band.CenterHz, 1.5 * d.Band.CenterHz);

    public static MeasurementFitResult Fit(PolarizerDesign design, Measurements m, FieldSolveCounter? counter = null)
    {
        var freqs = new SortedSet<double>();
        if (m.Fitted is { } fs) foreach (var p in fs.Points) freqs.Add(p.FrequencyHz);
        if (m.Bare is { } bs) foreach (var p in bs.Points) freqs.Add(p.FrequencyHz);
        if (m.Spin is { } sp) foreach (var p in sp) freqs.Add(p.FrequencyHz);
        var freqList = freqs.ToArray();
        var index = freqList.Select((f, i) => (f, i)).ToDictionary(x => x.f, x => x.i);
        var horizon = ObservationSet.Cone(0, 2 * Math.PI);
        var bare = m.Bare is null ? null : PolarizerEvaluator.SampleBareWhip(design.Whip.Kind, design.Whip.LengthM, design.Whip.RadiusM, freqList, horizon, counter,
            meshFrequencyHz: Math.Max(freqList[^1], MeshDensity.FrequencyHz(design)));

        double[] Residuals(double factor)
        {
            var r = new List<double>();
            var build = CalibrationFit.PinnedBuild(design, factor);
            build = build with { MeshFrequencyHz = Math.Max(freqList.Length > 0 ? freqList[^1] : 0, build.MeshFrequencyHz ?? 0) };
            var samples = freqList.Length > 0 ? PolarizerEvaluator.Sample(build, freqList, horizon, counter) : Array.Empty<CircularSamples>();
            if (m.Fitted is { } fitted)
            {
                double z0 = fitted.ReferenceOhm;
                foreach (var p in fitted.Points)
                {
                    var model = S11(samples[index[p.FrequencyHz]].ImpedanceOhm, z0);
                    if (m.Bare is { } bareSweep)
                    {
                        var measuredBare = Interpolate(bareSweep, p.FrequencyHz);
                        var modelBare = S11(bare![index[p.FrequencyHz]].ImpedanceOhm, bareSweep.ReferenceOhm);
                        r.Add(Complex.Abs((p.S11 - measuredBare) - (model - modelBare)));
                    }
                    else r.Add(Complex.Abs(p.S11 - model));
                }
            }
            if (m.Spin is { } spin)
                foreach (var p in spin)
                    r.Add((p.AxialRatioDb - AxialRatioDb(samples[index[p.FrequencyHz]])) / DbScale);
            if (m.ContrastDb is { } contrast)
                r.Add((contrast - CalibrationFit.CoCrossRatioDb(design, factor, m.ContrastFrequencyHz, counter)) / DbScale);
            return r.ToArray();
        }

        double Ssq(double logFactor) => Residuals(Math.Exp(logFactor)).Sum(x => x * x);
        double lo = Math.Log(MinimumFactor), hi = Math.Log(MaximumFactor);
        const int scan = 25;
        var grid = Enumerable.Range(0, scan).Select(i => lo + (hi - lo) * i / (scan - 1)).ToArray();
        var values = grid.Select(Ssq).ToArray();
        int best = Array.IndexOf(values, values.Min());
        double a = grid[Math.Max(0, best - 1)], b = grid[Math.Min(scan - 1, best + 1)];
        double g = (Math.Sqrt(5) - 1) / 2;
        double x1 = b - g * (b - a), x2 = a + g * (b - a), f1 = Ssq(x1), f2 = Ssq(x2);
        for (int it = 0; it < 30 && b - a > 1e-4; it++)
        {
            if (f1 < f2) { b = x2; x2 = x1; f2 = f1; x1 = b - g * (b - a); f1 = Ssq(x1); }
            else { a = x1; x1 = x2; f1 = f2; x2 = a + g * (b - a); f2 = Ssq(x2); }
        }
        double xBest = f1 < f2 ? x1 : x2, sBest = Math.Min(f1, f2);
        if (values[best] < sBest) { xBest = grid[best]; sBest = values[best]; }
        int n = Residuals(Math.Exp(xBest)).Length;
        double variance = n > 1 ? sBest / (n - 1) : sBest;
        double limit = sBest + Math.Max(variance, 1e-12);
        // The range: walk the scan outwards from the best while the sum of squares stays under the limit.
        double low = xBest, high = xBest;
        for (int i = best; i >= 0 && values[i] <= limit; i--) low = grid[i];
        for (int i = best; i < scan && values[i] <= limit; i++) high = grid[i];
        low = Math.Min(low, xBest); high = Math.Max(high, xBest);
        double factor = Math.Exp(xBest);
        var surroundings = CalibrationFit.PinnedBuild(design, factor).Surroundings;
        return new MeasurementFitResult(factor, Math.Exp(low), Math.Exp(high), Math.Sqrt(sBest / Math.Max(1, n)), surroundings.AddedInductanceHPerM, n);
    }

    private static Complex S11(Complex z, double z0) => (z - z0) / (z + z0);

    /// <summary>The bare sweep at a frequency of the fitted one: linear between its neighbours (clamped at its ends).</summary>
    private static Complex Interpolate(ReflectionSweep s, double f)
    {
        var p = s.Points;
        if (f <= p[0].FrequencyHz) return p[0].S11;
        if (f >= p[^1].FrequencyHz) return p[^1].S11;
        int k = 1;
        while (p[k].FrequencyHz < f) k++;
        double t = (f - p[k - 1].FrequencyHz) / (p[k].FrequencyHz - p[k - 1].FrequencyHz);
        return p[k - 1].S11 + t * (p[k].S11 - p[k - 1].S11);
    }

    /// <summary>Axial ratio at azimuth 0 on the horizon from the two circular power gains: AR = (1 + ρ)/(1 − ρ), ρ = sqrt(G_minor/G_major) (IEEE Std 145).</summary>
    private static double AxialRatioDb(CircularSamples s)
    {
        double gr = s.GainRhcp[0], gl = s.GainLhcp[0];
        double rho = Math.Sqrt(Math.Min(gr, gl) / Math.Max(Math.Max(gr, gl), 1e-300));
        return rho >= 1 - 1e-12 ? 60 : Math.Min(60, 20 * Math.Log10((1 + rho) / (1 - rho)));
    }
}
