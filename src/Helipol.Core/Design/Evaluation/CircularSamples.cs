using System.Numerics;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The solved polarizer at one frequency, sampled over an <see cref="ObservationSet"/>: input
/// impedance and, per direction, the right- and left-hand circular power gains (linear, referred
/// to the accepted power; IEEE Std 145). Everything a summary for either sense needs.
/// </summary>
public sealed class CircularSamples
{
    public CircularSamples(double frequencyHz, Complex impedanceOhm, IReadOnlyList<Direction> directions, double[] gainRhcp, double[] gainLhcp)
    {
        FrequencyHz = frequencyHz;
        ImpedanceOhm = impedanceOhm;
        Directions = directions;
        GainRhcp = gainRhcp;
        GainLhcp = gainLhcp;
    }

    public double FrequencyHz { get; }
    public Complex ImpedanceOhm { get; }
    public IReadOnlyList<Direction> Directions { get; }
    public double[] GainRhcp { get; }
    public double[] GainLhcp { get; }

    /// <summary>Samples a solution: gain = 4π|E_c|²/(2η0 P_in) per circular component.</summary>
    public static CircularSamples From(MomSolution solution, ObservationSet set)
    {
        var dirs = set.Directions;
        var r = new double[dirs.Count];
        var l = new double[dirs.Count];
        double pin = solution.InputPowerW;
        double scale = pin > 0 ? 4 * Math.PI / (2 * PhysicalConstants.Eta0 * pin) : 0;
        for (int i = 0; i < dirs.Count; i++)
        {
            var f = solution.FarFieldAt(dirs[i].ThetaRad, dirs[i].AzimuthRad);
            double er = f.RightHandV.Magnitude, el = f.LeftHandV.Magnitude;
            r[i] = scale * er * er;
            l[i] = scale * el * el;
        }
        return new CircularSamples(solution.FrequencyHz, solution.InputImpedanceOhm(), dirs, r, l);
    }

    /// <summary>Reflection-based VSWR against <paramref name="referenceOhm"/>: Γ = (Z − Z0)/(Z + Z0), VSWR = (1 + |Γ|)/(1 − |Γ|).</summary>
    public static double Vswr(Complex z, double referenceOhm = 50)
    {
        double g = ((z - referenceOhm) / (z + referenceOhm)).Magnitude;
        return g >= 1 ? double.PositiveInfinity : (1 + g) / (1 - g);
    }

    /// <summary>Reflection coefficient magnitude against a real reference: Γ = (Z − Z0)/(Z + Z0).</summary>
    public static double ReflectionMagnitude(Complex z, double referenceOhm) => ((z - referenceOhm) / (z + referenceOhm)).Magnitude;

    /// <summary>
    /// Summary of this frequency for the wanted <paramref name="sense"/>, with realized gains against
    /// <paramref name="receiverOhm"/>. The deciding direction is the one with the lowest wanted-over-unwanted
    /// ratio: where every direction radiates the wanted sense it carries the largest axial ratio; where
    /// any does not, it is the direction furthest into the wrong sense.
    /// </summary>
    public FrequencySummary Summarize(Sense sense, double receiverOhm = 50)
    {
        int n = Directions.Count;
        double worstScore = double.NegativeInfinity, sumScore = 0, maxAr = 0, sumAr = 0, sumR = 0, sumL = 0;
        int rightCount = 0, wrongCount = 0, worstIndex = 0;
        for (int i = 0; i < n; i++)
        {
            double co = sense == Sense.Rhcp ? GainRhcp[i] : GainLhcp[i];
            double cross = sense == Sense.Rhcp ? GainLhcp[i] : GainRhcp[i];
            double score = AxialRatioScore.Score(co, cross);
            if (score > worstScore) { worstScore = score; worstIndex = i; }
            sumScore += score;
            double ar = TrueAxialRatio.FromPowerGainsDb(GainRhcp[i], GainLhcp[i]);
            maxAr = Math.Max(maxAr, ar);
            sumAr += ar;
            sumR += GainRhcp[i];
            sumL += GainLhcp[i];
            if (GainRhcp[i] > GainLhcp[i]) rightCount++;
            if (cross > co) wrongCount++;
        }
        var byElevation = new SortedDictionary<double, double>();
        for (int i = 0; i < n; i++)
        {
            double el = Directions[i].ElevationRad;
            double co = sense == Sense.Rhcp ? GainRhcp[i] : GainLhcp[i];
            double cross = sense == Sense.Rhcp ? GainLhcp[i] : GainRhcp[i];
            double ar = cross > co ? double.PositiveInfinity : TrueAxialRatio.FromPowerGainsDb(GainRhcp[i], GainLhcp[i]);
            byElevation[el] = byElevation.TryGetValue(el, out var had) ? Math.Max(had, ar) : ar;
        }
        var worst = new DirectionSample(Directions[worstIndex], Db(GainRhcp[worstIndex]), Db(GainLhcp[worstIndex]),
            TrueAxialRatio.FromPowerGainsDb(GainRhcp[worstIndex], GainLhcp[worstIndex]), TrueAxialRatio.SenseOf(GainRhcp[worstIndex], GainLhcp[worstIndex]));
        return new FrequencySummary(FrequencyHz, ImpedanceOhm, worstScore, sumScore / n, worst, maxAr, sumAr / n,
            (double)wrongCount / n, 2 * rightCount >= n ? PolarizationSense.Rhcp : PolarizationSense.Lhcp,
            Db(sumR / n), Db(sumL / n)) { ReceiverOhm = receiverOhm, WantedSense = sense, ByElevation = byElevation.Select(kv => (kv.Key, kv.Value)).ToArray() };
    }

    internal static double Db(double ratio) => ratio > 1e-30 ? 10 * Math.Log10(ratio) : -300;
}

/// <summary>One far-field direction: its circular gains (dBic), true axial ratio (dB) and sense.</summary>
public readonly record struct DirectionSample(Direction Direction, double GainRhcpDbic, double GainLhcpDbic, double AxialRatioDb, PolarizationSense Sense);

/// <summary>
/// One frequency of an evaluation over a set of directions. Axial ratios here are true axial ratios
/// (the ellipse's axis ratio, IEEE Std 145), each with its sense; the search's score
/// (<see cref="AxialRatioScore"/>, <see cref="WorstScoreDb"/>, <see cref="MeanScoreDb"/>) stays internal
/// and is never printed as an axial ratio. Gains are the power mean over the directions, in dBic,
/// referred to the accepted power; realized gains include the mismatch to <see cref="ReceiverOhm"/>.
/// </summary>
public sealed record FrequencySummary(
    double FrequencyHz,
    Complex ImpedanceOhm,
    double WorstScoreDb,
    double MeanScoreDb,
    DirectionSample Worst,
    double MaxAxialRatioDb,
    double MeanAxialRatioDb,
    double WrongSenseShare,
    PolarizationSense Sense,
    double GainRhcpDbic,
    double GainLhcpDbic)
{
    /// <summary>Resistance the realized gains and <see cref="Vswr"/> are referred to, Ω.</summary>
    public double ReceiverOhm { get; init; } = 50;

    /// <summary>Per elevation (ascending), the worst wanted-sense axial ratio over azimuth, dB (+∞ where some azimuth has the wrong sense).</summary>
    public IReadOnlyList<(double ElevationRad, double WorstWantedArDb)> ByElevation { get; init; } = Array.Empty<(double, double)>();

    /// <summary>The sense this summary was judged for.</summary>
    public Model.Sense WantedSense { get; init; } = Model.Sense.Rhcp;

    public double Vswr50 => CircularSamples.Vswr(ImpedanceOhm, 50);

    /// <summary>VSWR against the receiver impedance.</summary>
    public double Vswr => CircularSamples.Vswr(ImpedanceOhm, ReceiverOhm);

    /// <summary>Mismatch factor 1 − |Γ|², as dB (≤ 0), Γ against the receiver impedance (IEEE Std 145, realized gain).</summary>
    public double MismatchDb
    {
        get
        {
            double g = CircularSamples.ReflectionMagnitude(ImpedanceOhm, ReceiverOhm);
            return g >= 1 ? double.NegativeInfinity : 10 * Math.Log10(1 - g * g);
        }
    }

    public double RealizedGainRhcpDbic => GainRhcpDbic + MismatchDb;
    public double RealizedGainLhcpDbic => GainLhcpDbic + MismatchDb;

    /// <summary>True when every direction radiates the wanted sense.</summary>
    public bool AllWantedSense => WrongSenseShare == 0 && Worst.Sense == (WantedSense == Model.Sense.Rhcp ? PolarizationSense.Rhcp : PolarizationSense.Lhcp);

    /// <summary>Worst true axial ratio in the wanted sense, dB; +∞ when some direction has the wrong sense.</summary>
    public double WorstWantedAxialRatioDb => AllWantedSense ? Worst.AxialRatioDb : double.PositiveInfinity;

    public double GainDbic(Model.Sense sense) => sense == Model.Sense.Rhcp ? GainRhcpDbic : GainLhcpDbic;
    public double RealizedGainDbic(Model.Sense sense) => sense == Model.Sense.Rhcp ? RealizedGainRhcpDbic : RealizedGainLhcpDbic;
}
