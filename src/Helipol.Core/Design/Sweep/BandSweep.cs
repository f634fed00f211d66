using Helipol.Model;

namespace Helipol.Design;

/// <summary>One frequency of a sweep: the polarizer and, for comparison, the bare whip.</summary>
public sealed record SweepPoint(FrequencySummary Polarizer, double BareWhipVswr50, double BareWhipGainDbic)
{
    /// <summary>The bare whip's realized gain in the wanted sense (mismatch to the receiver counted), dBic.</summary>
    public double BareWhipRealizedGainDbic { get; init; } = double.NaN;

    /// <summary>The bare whip's VSWR against the receiver impedance.</summary>
    public double BareWhipVswr { get; init; } = double.NaN;
}

/// <summary>Gain in the right- and left-hand senses along one pattern cut, dBic, at angles in degrees.</summary>
public sealed record PatternCut(string Name, double FrequencyHz, double[] AnglesDeg, double[] GainRhcpDbic, double[] GainLhcpDbic)
{
    /// <summary>Mismatch to the receiver at this frequency, 10·log10(1 − |Γ|²) dB: realized gain = gain + this, in every direction.</summary>
    public double MismatchDb { get; init; }

    /// <summary>The receiver resistance <see cref="MismatchDb"/> refers to, Ω.</summary>
    public double ReceiverOhm { get; init; } = 50;
}

/// <summary>
/// A frequency sweep of a solved geometry and what is read from it: the bandwidth where the true axial ratio in the wanted sense stays within the limit, the whip's
/// detuning by the polarizer, and two pattern cuts at the band centre.
/// </summary>
public sealed record SweepResult(
    IReadOnlyList<SweepPoint> Points,
    double ElevationRad,
    double BestArFrequencyHz,
    double BestArDb,
    double BandwidthLowHz,
    double BandwidthHighHz,
    PatternCut AzimuthCut,
    PatternCut ElevationCut,
    long FieldSolves)
{
    /// <summary>Axial-ratio limit the bandwidth is read at, dB (<c>solve.axial_ratio_limit</c>).</summary>
    public double LimitDb { get; init; } = 3;

    /// <summary>
    /// False when the lowest worst-AR point is the first or last of the sweep: the curve is still
    /// falling there, so the true minimum lies outside the swept range and <see cref="BestArDb"/> is only an edge value.
    /// </summary>
    public bool BestArInsideSweep => Points.Count < 2 || (BestArFrequencyHz != Points[0].Polarizer.FrequencyHz && BestArFrequencyHz != Points[^1].Polarizer.FrequencyHz);

    /// <summary>True when the lowest point is the sweep's last (highest) frequency.</summary>
    public bool BestArAtTopEdge => Points.Count >= 2 && BestArFrequencyHz == Points[^1].Polarizer.FrequencyHz;

    /// <summary>Width of the contiguous band around the best AR where the worst true AR in the wanted sense is ≤ the limit, Hz; 0 when the best is above it.</summary>
    public double BandwidthHz => BandwidthHighHz - BandwidthLowHz;
}

/// <summary>
/// Sweeps a build over band ± span (default 101 points, ±10 % of centre beyond the edges), on the
/// analysis cone (horizon for a dipole, 20° for a monopole, every 5° of azimuth), with the bare
/// whip beside it. Mesh once, frequencies in parallel (the engine's sweep).
/// </summary>
public static class BandSweep
{
    public static SweepResult Run(PolarizerDesign design, PolarizerBuild build, double? elevationRad = null, int? points = null, double? fromHz = null, double? toHz = null, FieldSolveCounter? counter = null)
    {
        counter ??= new FieldSolveCounter();
        long before = counter.Count;
        var band = design.Band;
        double span = design.Solve.Sweep.SpanFraction * band.CenterHz;
        double lo = fromHz ?? band.LowHz - span, hi = toHz ?? band.HighHz + span;
        int n = points ?? design.Solve.Sweep.Points;
        var freqs = n <= 1 ? new[] { band.CenterHz } : Enumerable.Range(0, n).Select(i => lo + (hi - lo) * i / (n - 1)).ToArray();
        double elevation = elevationRad ?? AnalysisCone.DefaultElevationRad(design.Whip.Kind);
        var cone = ObservationSet.Cone(elevation, design.Solve.AzimuthStepRad);
        var sense = design.Polarizer.Sense;
        double receiver = design.Solve.ReceiverOhm;
        var pol = PolarizerEvaluator.Evaluate(build, freqs, cone, sense, counter, receiverOhm: receiver);
        var bare = PolarizerEvaluator.SampleBareWhip(design.Whip.Kind, design.Whip.LengthM, design.Whip.RadiusM, freqs, cone, counter, meshFrequencyHz: build.MeshFrequencyHz)
            .Select(s => s.Summarize(sense, receiver)).ToArray();
        var sweep = pol.Select((p, i) => new SweepPoint(p, bare[i].Vswr50, bare[i].GainDbic(sense))
            { BareWhipRealizedGainDbic = bare[i].RealizedGainDbic(sense), BareWhipVswr = bare[i].Vswr }).ToArray();

        // The best point is found on the search's score (continuous through the wrong sense); the
        // axial ratio reported there, and the bandwidth, are the true wanted-sense axial ratio.
        var score = pol.Select(p => p.WorstScoreDb).ToArray();
        int k = Array.IndexOf(score, score.Min());
        var worst = pol.Select(p => p.WorstWantedAxialRatioDb).ToArray();
        double limit = design.Solve.AxialRatioLimitDb;
        var (bwLo, bwHi) = Bandwidth(freqs, worst, k, limit);
        var (az, el) = Cuts(design, build, counter);
        return new SweepResult(sweep, elevation, freqs[k], worst[k], bwLo, bwHi, az, el, counter.Count - before) { LimitDb = limit };
    }

    /// <summary>Edges where the curve crosses <paramref name="limit"/> on each side of sample k, by linear interpolation; (f_k, f_k) when sample k is above it.</summary>
    public static (double Low, double High) Bandwidth(double[] freqs, double[] values, int k, double limit)
    {
        if (values[k] > limit) return (freqs[k], freqs[k]);
        int i = k;
        while (i > 0 && values[i - 1] <= limit) i--;
        double low = i == 0 ? freqs[0] : Cross(freqs[i - 1], values[i - 1], freqs[i], values[i], limit);
        int j = k;
        while (j < freqs.Length - 1 && values[j + 1] <= limit) j++;
        double high = j == freqs.Length - 1 ? freqs[^1] : Cross(freqs[j], values[j], freqs[j + 1], values[j + 1], limit);
        return (low, high);
    }

    private static double Cross(double f0, double v0, double f1, double v1, double limit) =>
        v1 == v0 ? f0 : f0 + (limit - v0) / (v1 - v0) * (f1 - f0);

    /// <summary>Azimuth cut at the horizon (20° above the ground for a monopole) and elevation cut in the plane of azimuth 0, at the band centre, 5° steps.</summary>
    private static (PatternCut Azimuth, PatternCut Elevation) Cuts(PolarizerDesign design, PolarizerBuild build, FieldSolveCounter counter)
    {
        double deg = Math.PI / 180;
        double elevation = AnalysisCone.DefaultElevationRad(design.Whip.Kind);
        var azAngles = Enumerable.Range(0, 72).Select(i => i * 5.0).ToArray();
        // Elevation cut: a full circle in the x–z plane, angle measured from the horizon at azimuth 0
        // towards +z, over the top to azimuth 180 and round; below a ground plane there is no field.
        var elAngles = Enumerable.Range(0, 72).Select(i => i * 5.0).ToArray();
        var dirs = azAngles.Select(a => new Direction(elevation, a * deg))
            .Concat(elAngles.Select(a => a <= 90 ? new Direction(a * deg, 0) : a <= 270 ? new Direction((180 - a) * deg, Math.PI) : new Direction((a - 360) * deg, 0)))
            .ToArray();
        var s = PolarizerEvaluator.Sample(build, new[] { design.Band.CenterHz }, ObservationSet.Of(dirs), counter)[0];
        double Db(double g) => CircularSamples.Db(g);
        var azR = s.GainRhcp.Take(72).Select(Db).ToArray();
        var azL = s.GainLhcp.Take(72).Select(Db).ToArray();
        var elR = s.GainRhcp.Skip(72).Select(Db).ToArray();
        var elL = s.GainLhcp.Skip(72).Select(Db).ToArray();
        double receiver = design.Solve.ReceiverOhm;
        double mismatch = s.Summarize(design.Polarizer.Sense, receiver).MismatchDb;
        return (new PatternCut("azimuth", design.Band.CenterHz, azAngles, azR, azL) { MismatchDb = mismatch, ReceiverOhm = receiver },
            new PatternCut("elevation", design.Band.CenterHz, elAngles, elR, elL) { MismatchDb = mismatch, ReceiverOhm = receiver });
    }
}
