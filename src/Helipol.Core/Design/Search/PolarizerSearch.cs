using Helipol.Engine;
using Helipol.Model;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;

namespace Helipol.Design;

/// <summary>
/// The winner of a search, before the full report is made. <paramref name="LimitsReached"/> names each
/// searched quantity whose answer sits on an end of its search range: the true optimum may lie beyond.
/// </summary>
public sealed record SearchOutcome(
    int ElementCount, double OuterDiameterM, double ElementLengthM, double ElementRiseM, Winding Winding,
    double ObjectiveDb, AxialRatioMap Map, int Evaluations, long FieldSolves, IReadOnlyList<string> Steps)
{
    public IReadOnlyList<string> LimitsReached { get; init; } = Array.Empty<string>();
}

/// <summary>
/// Finds element length and rise (and element count and former diameter when they are auto)
/// that minimize the design's objective within the fabrication limits:
/// (1) a coarse outer loop over element count × former diameter, a small map each, when those are auto;
/// (2) a coarse map over length × rise (grid from <c>solve.search.grid</c>) for the best count and diameter,
///     its cells spread over the cores;
/// (3) Nelder–Mead (MathNet.Numerics, at most 40 iterations) from the two best cells, one per core;
/// (4) a compass polish at 0.2 mm steps in length and rise (scaled with wavelength above 5.8 GHz), so
///     the answer is a local minimum at the resolution a builder can cut.
/// Pinned values stay fixed: their axis is not searched. Candidates are scored with
/// <see cref="EvaluationPlan.ForSearch"/> (three frequencies, 10° elevation steps, one azimuth period).
/// </summary>
public static class PolarizerSearch
{
    /// <summary>Final compass step at 5.8 GHz, m: the finest length a builder trims (common practice, no source).</summary>
    public const double PolishStepAt5800MHzM = 0.2e-3;

    /// <summary>Grid per axis in the outer loop over element count and diameter.</summary>
    public const int OuterGrid = 5;

    /// <summary>Former diameters tried when <c>outer_diameter: auto</c>.</summary>
    public const int DiameterSteps = 3;

    public static SearchOutcome Run(PolarizerDesign design, double calibrationFactor, FieldSolveCounter? counter = null, IProgress<string>? progress = null)
    {
        counter ??= new FieldSolveCounter();
        var p = design.Polarizer;
        var s = design.Solve.Search;
        var scorer = new CandidateScorer(design, calibrationFactor, p.Winding, counter);
        var steps = new List<string>();

        var counts = p.ElementCount is { } n ? new[] { n } : Enumerable.Range(s.ElementCountMin, s.ElementCountMax - s.ElementCountMin + 1).ToArray();
        var diameters = p.Former.OuterDiameterM is { } d ? new[] { d } : Spread(s.OuterDiameterMinM, s.OuterDiameterMaxM, DiameterSteps);
        double maxRise = Math.Min(s.ElementRiseMaxM, scorer.Limits.MaximumRiseM);
        var lengths = p.ElementLengthM is { } l ? new[] { l } : Spread(s.ElementLengthMinM, s.ElementLengthMaxM, s.GridPoints);
        var rises = p.ElementRiseM is { } h ? new[] { h } : Spread(Math.Min(s.ElementRiseMinM, maxRise), maxRise, s.GridPoints);

        int bestCount = counts[0];
        double bestDiameter = diameters[0];
        if (counts.Length * diameters.Length > 1)
        {
            var coarseL = p.ElementLengthM is { } l1 ? new[] { l1 } : Spread(lengths[0], lengths[^1], OuterGrid);
            var coarseH = p.ElementRiseM is { } h1 ? new[] { h1 } : Spread(rises[0], rises[^1], OuterGrid);
            double bestValue = double.PositiveInfinity;
            foreach (var count in counts)
                foreach (var diameter in diameters)
                {
                    var map = Map(scorer, count, diameter, coarseL, coarseH);
                    steps.Add(FormattableString.Invariant($"outer loop: {count} elements on {diameter * 1e3:0.##} mm, best cell objective {map.BestValue:0.##} dB"));
                    progress?.Report(steps[^1]);
                    if (map.BestValue < bestValue) { bestValue = map.BestValue; bestCount = count; bestDiameter = diameter; }
                }
        }

        bool pinned = counts.Length == 1 && diameters.Length == 1 && p.ElementLengthM is not null && p.ElementRiseM is not null;
        var fine = Map(scorer, bestCount, bestDiameter, lengths, rises);
        if (!pinned)
        {
            steps.Add(FormattableString.Invariant($"map {lengths.Length} × {rises.Length} over length × rise for {bestCount} elements on {bestDiameter * 1e3:0.##} mm: best cell objective {fine.BestValue:0.##} dB"));
            progress?.Report(steps[^1]);
        }
        var ranked = fine.Ranked().Take(2).ToArray();
        if (ranked.Length == 0)
            throw new SearchException("no element length and rise in the search range can be built on this former (rise, spacing or bend radius out of limits)");

        double polish = PolishStepAt5800MHzM * Math.Max(1, 5.8e9 / design.Band.CenterHz);
        var starts = new (double L, double H, double V, Winding W)[ranked.Length];
        Parallel.For(0, ranked.Length, Parallelism.Options(), k =>
        {
            var (i, j, v) = ranked[k];
            starts[k] = Refine(scorer, bestCount, bestDiameter, fine.LengthsM[i], fine.RisesM[j], v, fine.Winding[i, j],
                p.ElementLengthM is null, p.ElementRiseM is null, Step(lengths), Step(rises), polish);
        });
        var winner = starts.Select((x, k) => (x, k)).OrderBy(t => t.x.V).ThenBy(t => t.k).First().x;
        steps.Add(pinned
            ? FormattableString.Invariant($"no search: element count, length, rise and former diameter are all pinned; the geometry as written scores objective {winner.V:0.###} dB with the {Word(winner.W)} winding{(p.Winding == Winding.Auto ? " (the better of the two)" : "")}")
            : FormattableString.Invariant($"local refinement from {ranked.Length} best cells (Nelder–Mead, then compass at {polish * 1e3:0.##} mm): objective {winner.V:0.###} dB at {winner.L * 1e3:0.###} mm × {winner.H * 1e3:0.###} mm, {Word(winner.W)} winding"));
        progress?.Report(steps[^1]);
        return new SearchOutcome(bestCount, bestDiameter, winner.L, winner.H, winner.W, winner.V, fine, scorer.Evaluations, counter.Count, steps)
        {
            LimitsReached = LimitsReached(counts, diameters, lengths, rises, bestCount, bestDiameter, winner.L, winner.H, polish,
                p.ElementLengthM is null, p.ElementRiseM is null, scorer.Limits.MaximumRiseM),
        };
    }

    /// <summary>
    /// Each searched quantity whose answer lies on (or, after the local refinement, beyond) an end of
    /// its range, in words. An optimum on a search limit is not known to be an optimum: the objective
    /// may keep falling past it.
    /// </summary>
    public static IReadOnlyList<string> LimitsReached(int[] counts, double[] diameters, double[] lengths, double[] rises,
        int count, double diameterM, double lengthM, double riseM, double polishM, bool lengthFree, bool riseFree, double fabricationMaxRiseM)
    {
        var found = new List<string>();
        string Mm(double m) => FormattableString.Invariant($"{m * 1e3:0.##} mm");
        if (counts.Length > 1 && (count == counts[0] || count == counts[^1]))
            found.Add(FormattableString.Invariant($"element count {count} is the {(count == counts[0] ? "fewest" : "most")} searched ({Keys.SolveSearchElements})"));
        if (diameters.Length > 1 && (diameterM == diameters[0] || diameterM == diameters[^1]))
            found.Add($"former diameter {Mm(diameterM)} is the {(diameterM == diameters[0] ? "smallest" : "largest")} searched ({Keys.SolveSearchOuterDiameter})");
        double tol = polishM / 2;
        if (lengthFree && lengths.Length > 1 && (lengthM <= lengths[0] + tol || lengthM >= lengths[^1] - tol))
            found.Add($"element length {Mm(lengthM)} is at the {(lengthM <= lengths[0] + tol ? "short" : "long")} end of the search range {Mm(lengths[0])} to {Mm(lengths[^1])} ({Keys.SolveSearchElementLength})");
        if (riseFree && rises.Length > 1 && (riseM <= rises[0] + tol || riseM >= rises[^1] - tol))
            found.Add(riseM >= rises[^1] - tol && rises[^1] >= fabricationMaxRiseM - 1e-9
                ? $"element rise {Mm(riseM)} is the largest the former height allows ({Keys.PolarizerFormerHeight})"
                : $"element rise {Mm(riseM)} is at the {(riseM <= rises[0] + tol ? "low" : "high")} end of the search range {Mm(rises[0])} to {Mm(rises[^1])} ({Keys.SolveSearchElementRise})");
        return found;
    }

    private static string Word(Winding w) => ChoiceWords.Winding.Word(w);

    private static double Step(double[] axis) => axis.Length > 1 ? axis[1] - axis[0] : 0;

    /// <summary><paramref name="count"/> evenly spaced values from a to b.</summary>
    public static double[] Spread(double a, double b, int count) => count <= 1 || b <= a
        ? new[] { a }
        : Enumerable.Range(0, count).Select(i => a + (b - a) * i / (count - 1)).ToArray();

    private static AxialRatioMap Map(CandidateScorer scorer, int count, double diameter, double[] lengths, double[] rises)
    {
        var values = new double[lengths.Length, rises.Length];
        var windings = new Winding[lengths.Length, rises.Length];
        Parallel.For(0, lengths.Length * rises.Length, Parallelism.Options(), cell =>
        {
            int i = cell / rises.Length, j = cell % rises.Length;
            var (v, w) = scorer.Score(count, diameter, lengths[i], rises[j]);
            values[i, j] = v >= CandidateScorer.Unbuildable ? double.NaN : v;
            windings[i, j] = w;
        });
        return new AxialRatioMap(count, diameter, lengths, rises, values, windings);
    }

    private static (double L, double H, double V, Winding W) Refine(CandidateScorer scorer, int count, double diameter,
        double l0, double h0, double v0, Winding w0, bool freeL, bool freeH, double stepL, double stepH, double polish)
    {
        // Work in millimetres so both axes have similar scale for the simplex.
        var best = (L: l0, H: h0, V: v0, W: w0);
        var cache = new Dictionary<(long, long), (double, Winding)>();
        (double, Winding) Eval(double l, double h)
        {
            var key = ((long)Math.Round(l * 1e9), (long)Math.Round(h * 1e9));
            if (cache.TryGetValue(key, out var hit)) return hit;
            var r = scorer.Score(count, diameter, l, h);
            cache[key] = r;
            if (r.Item1 < best.V) best = (l, h, r.Item1, r.Item2);
            return r;
        }

        int free = (freeL ? 1 : 0) + (freeH ? 1 : 0);
        if (free > 0)
        {
            double Objective(Vector<double> x)
            {
                int k = 0;
                double l = freeL ? x[k++] * 1e-3 : l0;
                double h = freeH ? x[k] * 1e-3 : h0;
                return Eval(l, h).Item1;
            }
            var start = Vector<double>.Build.DenseOfEnumerable(new[] { freeL ? l0 * 1e3 : double.NaN, freeH ? h0 * 1e3 : double.NaN }.Where(v => !double.IsNaN(v)));
            var kick = Vector<double>.Build.DenseOfEnumerable(new[] { freeL ? stepL * 1e3 / 2 : double.NaN, freeH ? stepH * 1e3 / 2 : double.NaN }.Where(v => !double.IsNaN(v)).Select(v => v > 0 ? v : 0.5));
            try
            {
                NelderMeadSimplex.Minimum(ObjectiveFunction.Value(Objective), start, kick, 1e-3, 40);
            }
            catch (MaximumIterationsException) { /* keep the best point seen */ }
            catch (Exception ex) when (ex is ArgumentException or InvalidOperationException) { /* keep the best point seen */ }

            // Compass polish: no neighbour one builder's step away may be better.
            bool moved = true;
            int guard = 0;
            while (moved && guard++ < 40)
            {
                moved = false;
                var (l, h) = (best.L, best.H);
                foreach (var (dl, dh) in new[] { (1, 0), (-1, 0), (0, 1), (0, -1) })
                {
                    if ((dl != 0 && !freeL) || (dh != 0 && !freeH)) continue;
                    var before = best.V;
                    Eval(l + dl * polish, h + dh * polish);
                    if (best.V < before) { moved = true; break; }
                }
            }
        }
        else Eval(l0, h0);
        return best;
    }
}

/// <summary>The search could not find a buildable geometry; the message says why.</summary>
public sealed class SearchException(string message) : Exception(message);
