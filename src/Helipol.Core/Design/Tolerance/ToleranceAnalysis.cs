using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>How the solved geometry fares when built by hand.</summary>
public sealed record ToleranceResult(
    int Builds,
    int Seed,
    double Yield,
    double[] WorstArDbByBuild,
    double ArP10Db,
    double ArP50Db,
    double ArP90Db,
    double ArPerMmLengthDb,
    double ArPerMmRiseDb,
    double BestArMHzPerMmLength,
    double BestArMHzPerMmRise,
    double BestArFrequencyHz,
    double LengthChangeToCentreMm,
    string TrimmingHint,
    string TrimmingSummary,
    long FieldSolves);

/// <summary>
/// Monte Carlo over builds. Every build's perturbations are drawn up front, in build order, from
/// one generator seeded by <c>tolerance.seed</c>, so the result does not depend on how many threads
/// evaluate them. Each element gets its own length, rise and azimuth error (uniform within the
/// design's ± spreads); each build one wrap-thickness error. A build passes when its worst axial
/// ratio in the wanted sense is ≤ 3 dB at the band's low, centre and high frequency on the analysis
/// cone, every 10° of azimuth: fewer points than the solve uses, so 500 builds take about a second on
/// two cores (figures from <c>make bench</c> in the README). A build whose wires would touch counts as failed.
/// The trimming hint is <see cref="TrimmingHint"/> on the nominal build's best-AR frequency and its slope.
/// </summary>
public static class ToleranceAnalysis
{
    public const double PassArDb = 3;
    public const double AzimuthStepRad = 10 * Math.PI / 180;

    public static ToleranceResult Run(PolarizerDesign design, PolarizerBuild nominal, int? builds = null, FieldSolveCounter? counter = null)
    {
        counter ??= new FieldSolveCounter();
        long before = counter.Count;
        var t = design.Tolerance;
        int count = builds ?? t.Builds;
        var rng = new Random(t.Seed);
        double U(double half) => half * (2 * rng.NextDouble() - 1);
        var variants = new PolarizerBuild[count];
        for (int b = 0; b < count; b++)
        {
            var elements = nominal.Elements.Select(e => new ElementPlacement(e.LengthM + U(t.ElementLengthM), e.RiseM + U(t.ElementRiseM), e.StartAzimuthRad + U(t.AzimuthRad))).ToArray();
            double wrap = 1 + U(t.WrapThicknessFraction);
            variants[b] = nominal with { Elements = elements, Surroundings = nominal.Surroundings.WithWrapScaled(wrap) };
        }
        var freqs = EvaluationPlan.BandFrequencies(design.Band, 3);
        var cone = ObservationSet.Cone(AnalysisCone.DefaultElevationRad(design.Whip.Kind), AzimuthStepRad);
        var sense = design.Polarizer.Sense;
        var worst = new double[count];
        Parallel.For(0, count, Parallelism.Options(), b =>
        {
            try
            {
                worst[b] = PolarizerEvaluator.Evaluate(variants[b], freqs, cone, sense, counter, maxParallelism: 1).Max(p => p.WorstScoreDb);
            }
            catch (ModelException)
            {
                worst[b] = double.PositiveInfinity;
            }
        });
        double yield = worst.Count(w => w <= PassArDb) / (double)count;
        var sorted = worst.OrderBy(w => w).ToArray();

        // Sensitivities by central differences on the nominal build (every element changed alike).
        double scale = Math.Max(1, 5.8e9 / design.Band.CenterHz);
        double step = 0.25e-3 * scale;
        double Ar(PolarizerBuild b) => PolarizerEvaluator.Evaluate(b, new[] { design.Band.CenterHz }, cone, sense, counter)[0].WorstScoreDb;
        PolarizerBuild Shift(double dl, double dh) => nominal with { Elements = nominal.Elements.Select(e => e with { LengthM = e.LengthM + dl, RiseM = e.RiseM + dh }).ToArray() };
        double arL = (Ar(Shift(step, 0)) - Ar(Shift(-step, 0))) / (2 * step * 1e3);
        double arH = (Ar(Shift(0, step)) - Ar(Shift(0, -step))) / (2 * step * 1e3);
        double fL = (BestArFrequencyHz(design, Shift(step, 0), counter) - BestArFrequencyHz(design, Shift(-step, 0), counter)) / (2 * step * 1e3) / 1e6;
        double fH = (BestArFrequencyHz(design, Shift(0, step), counter) - BestArFrequencyHz(design, Shift(0, -step), counter)) / (2 * step * 1e3) / 1e6;
        double best = BestArFrequencyHz(design, nominal, counter);
        var advice = TrimmingHint.For(design.Band.CenterHz, best, fL, PolarizerSearch.PolishStepAt5800MHzM * scale * 1e3, t.ElementLengthM * 1e3);
        return new ToleranceResult(count, t.Seed, yield, worst, Percentile(sorted, 0.1), Percentile(sorted, 0.5), Percentile(sorted, 0.9),
            arL, arH, fL, fH, best, advice.LengthChangeMm, advice.Text, advice.Summary, counter.Count - before);
    }

    /// <summary>
    /// Frequency of the best mean-AR score on the analysis cone, over the centre ± 8 % in 33 steps
    /// with a parabolic refinement; NaN when the lowest sample is at either end (no minimum inside).
    /// </summary>
    public static double BestArFrequencyHz(PolarizerDesign design, PolarizerBuild build, FieldSolveCounter? counter = null)
    {
        double fc = design.Band.CenterHz;
        var freqs = Enumerable.Range(0, 33).Select(i => fc * (0.92 + 0.16 * i / 32)).ToArray();
        var cone = ObservationSet.Cone(AnalysisCone.DefaultElevationRad(design.Whip.Kind), AzimuthStepRad);
        var score = PolarizerEvaluator.Evaluate(build, freqs, cone, design.Polarizer.Sense, counter).Select(p => p.MeanScoreDb).ToArray();
        int k = Array.IndexOf(score, score.Min());
        if (k == 0 || k == score.Length - 1) return double.NaN;
        double a = score[k - 1], b = score[k], c = score[k + 1];
        double denom = a - 2 * b + c;
        double shift = denom > 0 ? 0.5 * (a - c) / denom : 0;
        return freqs[k] + Math.Clamp(shift, -1, 1) * (freqs[k + 1] - freqs[k]);
    }

    /// <summary>Nearest-rank percentile of sorted values (p in 0..1).</summary>
    public static double Percentile(double[] sorted, double p)
    {
        if (sorted.Length == 0) return double.NaN;
        int rank = (int)Math.Ceiling(p * sorted.Length);
        return sorted[Math.Clamp(rank - 1, 0, sorted.Length - 1)];
    }
}
