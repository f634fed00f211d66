using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Fits the coating calibration factor to a measured build (one-dimensional root search). The
/// build must be pinned in its design file (element count, length, rise, diameter): it is what
/// was made. More dielectric loading makes the elements electrically longer, so the best-AR
/// frequency falls as the factor grows; bisection on the factor finds where it lands on the
/// measured frequency.
/// </summary>
public static class CalibrationFit
{
    /// <summary>Factors searched; 0 removes the dielectric altogether.</summary>
    public const double MinimumFactor = 0, MaximumFactor = 60;

    /// <summary>Frequencies in the best-AR sweep, over ±20 % of the band centre.</summary>
    public const int SweepPoints = 41;
    public const double SweepSpan = 0.2;

    /// <summary>
    /// Frequency of the best axial ratio of the pinned build at calibration factor
    /// <paramref name="factor"/>: the minimum over a sweep of the mean axial-ratio score (the better of
    /// the two senses, since the winding only mirrors it) on the analysis cone, refined by a parabola
    /// through the lowest sample and its neighbours.
    /// </summary>
    public static double BestArFrequencyHz(PolarizerDesign design, double factor, FieldSolveCounter? counter = null)
    {
        var build = PinnedBuild(design, factor);
        double fc = design.Band.CenterHz;
        var freqs = Enumerable.Range(0, SweepPoints).Select(i => fc * (1 - SweepSpan + 2 * SweepSpan * i / (SweepPoints - 1))).ToArray();
        var cone = ObservationSet.Cone(AnalysisCone.DefaultElevationRad(design.Whip.Kind), design.Solve.AzimuthStepRad);
        var samples = PolarizerEvaluator.Sample(build, freqs, cone, counter);
        var score = samples.Select(s => Math.Min(s.Summarize(Sense.Rhcp).MeanScoreDb, s.Summarize(Sense.Lhcp).MeanScoreDb)).ToArray();
        int k = Array.IndexOf(score, score.Min());
        if (k == 0 || k == score.Length - 1) return freqs[k];
        double a = score[k - 1], b = score[k], c = score[k + 1];
        double denom = a - 2 * b + c;
        double shift = denom > 0 ? 0.5 * (a - c) / denom : 0;
        return freqs[k] + Math.Clamp(shift, -1, 1) * (freqs[k + 1] - freqs[k]);
    }

    /// <summary>The factor that puts the model's best-AR frequency at <paramref name="measuredHz"/>.</summary>
    public static CoatingCalibration FitBestArFrequency(PolarizerDesign design, double measuredHz, string designShownAs, FieldSolveCounter? counter = null)
    {
        double Gap(double f) => BestArFrequencyHz(design, f, counter) - measuredHz;
        double lo = MinimumFactor, hi = MaximumFactor;
        double gLo = Gap(lo), gHi = Gap(hi);
        if (gLo < 0 || gHi > 0)
            throw new CalibrationException(FormattableString.Invariant(
                $"{designShownAs}: --best-at: found {measuredHz / 1e9:0.####} GHz, allowed a best-AR frequency the model can reach with this build: {(measuredHz + gHi) / 1e9:0.####} to {(measuredHz + gLo) / 1e9:0.####} GHz"));
        for (int i = 0; i < 30 && hi - lo > 1e-3 * Math.Max(1, lo); i++)
        {
            double mid = 0.5 * (lo + hi);
            if (Gap(mid) > 0) lo = mid; else hi = mid;
        }
        double factor = 0.5 * (lo + hi);
        return new CoatingCalibration(CoatingCalibration.MaterialSetOf(design.Polarizer), factor,
            FormattableString.Invariant($"best axial ratio measured at {measuredHz / 1e9:0.####} GHz; factor found by bisection so the model's best-AR frequency lands there"),
            designShownAs, "fitted by helipol calibrate to a measured build");
    }

    /// <summary>
    /// Co/cross ratio at the horizon (dB, mean power over azimuth) of the pinned build at
    /// <paramref name="frequencyHz"/>: how much more a receiver of the better sense collects than one of
    /// the other. By mirror symmetry it equals the gain between the right and the wrong winding
    /// into a fixed circularly polarized receiver.
    /// </summary>
    public static double CoCrossRatioDb(PolarizerDesign design, double factor, double frequencyHz, FieldSolveCounter? counter = null)
    {
        var cone = ObservationSet.Cone(AnalysisCone.DefaultElevationRad(design.Whip.Kind), design.Solve.AzimuthStepRad);
        var s = PolarizerEvaluator.Sample(PinnedBuild(design, factor), new[] { frequencyHz }, cone, counter)[0].Summarize(Sense.Rhcp);
        return Math.Abs(s.GainRhcpDbic - s.GainLhcpDbic);
    }

    /// <summary>
    /// The smallest factor at which the pinned build's co/cross ratio reaches <paramref name="targetDb"/>
    /// (scan in steps of 0.5 from 1, then bisection). The smallest, because the ratio rises to a peak
    /// at the AR optimum and falls beyond it: the smallest factor is the least loading that explains
    /// the measurement.
    /// </summary>
    public static double FitCoCrossRatio(PolarizerDesign design, double targetDb, double frequencyHz, FieldSolveCounter? counter = null)
    {
        double prev = 1;
        if (CoCrossRatioDb(design, prev, frequencyHz, counter) >= targetDb) return prev;
        for (double f = 1.5; f <= MaximumFactor; f += 0.5)
        {
            if (CoCrossRatioDb(design, f, frequencyHz, counter) >= targetDb)
            {
                double lo = prev, hi = f;
                for (int i = 0; i < 20; i++)
                {
                    double mid = 0.5 * (lo + hi);
                    if (CoCrossRatioDb(design, mid, frequencyHz, counter) >= targetDb) hi = mid; else lo = mid;
                }
                return 0.5 * (lo + hi);
            }
            prev = f;
        }
        throw new CalibrationException(FormattableString.Invariant($"no factor up to {MaximumFactor} gives a {targetDb} dB co/cross ratio"));
    }

    /// <summary>The build exactly as pinned in the design file (winding right when auto: the fit does not depend on it).</summary>
    public static PolarizerBuild PinnedBuild(PolarizerDesign design, double factor)
    {
        var layout = PinnedLayout.Require(design);
        var winding = design.Polarizer.Winding == Winding.Auto ? Winding.Right : design.Polarizer.Winding;
        return PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, winding, factor);
    }
}
