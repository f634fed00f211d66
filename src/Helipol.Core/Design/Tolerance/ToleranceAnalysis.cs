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
    long FieldSolves)
{
    /// <summary>Axial-ratio limit the yield was judged against, dB (the design's <c>solve.axial_ratio_limit</c>).</summary>
    public double LimitDb { get; init; } = 3;

    /// <summary>Share of builds whose axial-ratio grade is not <c>fails</c>: wanted sense everywhere, AR within the limit + 3 dB.</summary>
    public double UsableYield { get; init; } = double.NaN;

    /// <summary>± length error (every element alike) that keeps the best-AR frequency inside the band in 90 % of builds, mm; 0 when the nominal best AR is outside the band, NaN without a slope.</summary>
    public double CutToleranceMm { get; init; } = double.NaN;

    /// <summary>The rise tolerance held with <see cref="CutToleranceMm"/> (same share of the design's spreads), mm.</summary>
    public double RiseToleranceMm { get; init; } = double.NaN;

    /// <summary>"cut to within ± x mm" in words, for the report and the bend sheet.</summary>
    public string CutText => !double.IsFinite(CutToleranceMm)
        ? string.Create(System.Globalization.CultureInfo.InvariantCulture, $"no cut tolerance: the axial ratio has no minimum within {LimitDb + VerdictJudge.MarginalArExtraDb:0.#} dB near the band to hold in it")
        : CutToleranceMm <= 0
            ? "no cut tolerance: the best axial ratio lies outside the band even as designed"
            : string.Create(System.Globalization.CultureInfo.InvariantCulture, $"cut to within ±{CutToleranceMm:0.0#} mm (rise ±{RiseToleranceMm:0.0#} mm) to keep the best axial ratio inside the band in 90 % of builds");
}

/// <summary>
/// Monte Carlo over builds. Every build's perturbations are drawn up front, in build order, from
/// one generator seeded by <c>tolerance.seed</c>, so the result does not depend on how many threads
/// evaluate them. Each element gets its own length, rise and azimuth error (uniform within the
/// design's ± spreads); each build one wrap-thickness error. A build passes on the verdict's axial-ratio
/// criterion: every direction of the coverage window radiates the wanted sense with a true axial ratio
/// ≤ <c>solve.axial_ratio_limit</c>, at the band's low, centre and high frequency, elevations at least 10°
/// apart and every 10° of azimuth over the window's span (the errors break the elements' symmetry, so
/// no azimuth period is assumed). A build whose wires would touch counts as failed.
/// The trimming hint is <see cref="TrimmingHint"/> on the nominal build's best-AR frequency and its slope,
/// both judged like the objective (worst score over the window), and checked so that it never flips the
/// sense anywhere in the window.
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
        var s = design.Solve;
        var window = ObservationSet.Coverage(s.ElevationFromRad, s.ElevationToRad, Math.Max(s.ElevationStepRad, EvaluationPlan.SearchElevationStepRad), AzimuthStepRad, s.AzimuthSpanRad);
        var sense = design.Polarizer.Sense;
        var worst = new double[count];
        Parallel.For(0, count, Parallelism.Options(), b =>
        {
            try
            {
                worst[b] = PolarizerEvaluator.Evaluate(variants[b], freqs, window, sense, counter, maxParallelism: 1).Max(p => p.WorstWantedAxialRatioDb);
            }
            catch (ModelException)
            {
                worst[b] = double.PositiveInfinity;
            }
        });
        double yield = worst.Count(w => w <= s.AxialRatioLimitDb) / (double)count;
        var sorted = worst.OrderBy(w => w).ToArray();
        var cone = ObservationSet.Cone(AnalysisCone.DefaultElevationRad(design.Whip.Kind), AzimuthStepRad);

        // Sensitivities by central differences on the nominal build (every element changed alike).
        double scale = Math.Max(1, 5.8e9 / design.Band.CenterHz);
        double step = 0.25e-3 * scale;
        double Ar(PolarizerBuild b) => PolarizerEvaluator.Evaluate(b, new[] { design.Band.CenterHz }, cone, sense, counter)[0].Worst.AxialRatioDb;
        PolarizerBuild Shift(double dl, double dh) => nominal with { Elements = nominal.Elements.Select(e => e with { LengthM = e.LengthM + dl, RiseM = e.RiseM + dh }).ToArray() };
        double arL = (Ar(Shift(step, 0)) - Ar(Shift(-step, 0))) / (2 * step * 1e3);
        double arH = (Ar(Shift(0, step)) - Ar(Shift(0, -step))) / (2 * step * 1e3);
        double fL = (BestArFrequencyHz(design, Shift(step, 0), counter) - BestArFrequencyHz(design, Shift(-step, 0), counter)) / (2 * step * 1e3) / 1e6;
        double fH = (BestArFrequencyHz(design, Shift(0, step), counter) - BestArFrequencyHz(design, Shift(0, -step), counter)) / (2 * step * 1e3) / 1e6;
        double best = BestArFrequencyHz(design, nominal, counter, out double bestScore);
        var advice = TrimmingHint.For(design.Band.CenterHz, best, fL, PolarizerSearch.PolishStepAt5800MHzM * scale * 1e3, t.ElementLengthM * 1e3);
        advice = KeepSense(design, nominal, advice, counter);
        // A best AR that fails even at its best is no target to hold in the band.
        var (cut, rise) = bestScore <= s.AxialRatioLimitDb + VerdictJudge.MarginalArExtraDb
            ? CutTolerance.For(design.Band.LowHz, design.Band.HighHz, best, fL, fH, t.ElementLengthM * 1e3, t.ElementRiseM * 1e3)
            : (double.NaN, double.NaN);
        return new ToleranceResult(count, t.Seed, yield, worst, Percentile(sorted, 0.1), Percentile(sorted, 0.5), Percentile(sorted, 0.9),
            arL, arH, fL, fH, best, advice.LengthChangeMm, advice.Text, advice.Summary, counter.Count - before)
        {
            LimitDb = s.AxialRatioLimitDb,
            UsableYield = worst.Count(w => w <= s.AxialRatioLimitDb + VerdictJudge.MarginalArExtraDb) / (double)count,
            CutToleranceMm = cut,
            RiseToleranceMm = rise,
        };
    }

    /// <summary>
    /// A proposed length change is tried on the objective's own plan (every band frequency, the whole
    /// coverage window); if it puts any direction into the wrong sense that was right before (more
    /// wrong-sense directions than the nominal build has), it is halved up to three times, and dropped
    /// when no step is safe.
    /// </summary>
    private static TrimmingAdvice KeepSense(PolarizerDesign design, PolarizerBuild nominal, TrimmingAdvice advice, FieldSolveCounter counter)
    {
        double change = advice.LengthChangeMm;
        if (!double.IsFinite(change) || advice.Text.StartsWith("no trimming needed", StringComparison.Ordinal)) return advice;
        var plan = EvaluationPlan.ForDesign(design, nominal.ElementCount);
        var sense = design.Polarizer.Sense;
        IReadOnlyList<FrequencySummary> At(double dMm) => PolarizerEvaluator.Evaluate(
            nominal with { Elements = nominal.Elements.Select(e => e with { LengthM = e.LengthM + dMm * 1e-3 }).ToArray() },
            plan.FrequenciesHz, plan.Directions, sense, counter);
        // Directions off the wanted sense, summed over the band (a linear deciding direction counts too).
        static double Wrong(IReadOnlyList<FrequencySummary> points) => points.Sum(p => p.AllWantedSense ? 0 : Math.Max(p.WrongSenseShare, 1e-9));
        double nominalWrong;
        try { nominalWrong = Wrong(At(0)); }
        catch (ModelException) { return advice; }
        string? flipped = null;
        for (int halving = 0; halving < 4; halving++)
        {
            double d = change / Math.Pow(2, halving);
            IReadOnlyList<FrequencySummary> points;
            try { points = At(d); }
            catch (ModelException) { continue; }
            if (Wrong(points) > nominalWrong + 1e-12)
            {
                var at = points.First(p => !p.AllWantedSense);
                flipped ??= string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"{at.FrequencyHz / 1e6:0.#} MHz, {SignedNumber.Plain(at.Worst.Direction.ElevationRad * 180 / Math.PI, "0.#")}° elevation");
                continue;
            }
            return halving == 0 ? advice : TrimmingHint.Limited(advice, d, flipped);
        }
        return TrimmingHint.Refused(advice, flipped);
    }

    /// <summary>
    /// Frequency of the best objective score (worst or mean, as <c>solve.objective</c>) over the coverage window, over the centre ± 8 % in 33 steps
    /// with a parabolic refinement; NaN when the lowest sample is at either end (no minimum inside).
    /// </summary>
    public static double BestArFrequencyHz(PolarizerDesign design, PolarizerBuild build, FieldSolveCounter? counter = null) =>
        BestArFrequencyHz(design, build, counter, out _);

    /// <summary>As above; <paramref name="bestScore"/> is the lowest sampled score (the worst axial ratio there while under 30 dB in the wanted sense).</summary>
    public static double BestArFrequencyHz(PolarizerDesign design, PolarizerBuild build, FieldSolveCounter? counter, out double bestScore)
    {
        double fc = design.Band.CenterHz;
        var freqs = Enumerable.Range(0, 33).Select(i => fc * (0.92 + 0.16 * i / 32)).ToArray();
        // Judged like the objective: the search's directions over the coverage window, worst (or mean) score.
        var plan = EvaluationPlan.ForSearch(design, build.ElementCount);
        var score = PolarizerEvaluator.Evaluate(build, freqs, plan.Directions, design.Polarizer.Sense, counter)
            .Select(p => design.Solve.Objective == Objective.MeanAxialRatio ? p.MeanScoreDb : p.WorstScoreDb).ToArray();
        int k = Array.IndexOf(score, score.Min());
        bestScore = score[k];
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
