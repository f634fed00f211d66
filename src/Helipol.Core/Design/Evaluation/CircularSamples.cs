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

    /// <summary>Summary of this frequency for the wanted <paramref name="sense"/>.</summary>
    public FrequencySummary Summarize(Sense sense)
    {
        int n = Directions.Count;
        double worstScore = double.NegativeInfinity, sumScore = 0, worstAr = 0, sumAr = 0, sumR = 0, sumL = 0;
        int rightCount = 0;
        for (int i = 0; i < n; i++)
        {
            double co = sense == Sense.Rhcp ? GainRhcp[i] : GainLhcp[i];
            double cross = sense == Sense.Rhcp ? GainLhcp[i] : GainRhcp[i];
            double score = AxialRatioScore.Score(co, cross);
            worstScore = Math.Max(worstScore, score);
            sumScore += score;
            double ar = Math.Min(Polarization.MaxAxialRatioDb, AxialRatioScore.AxialRatioDbFromCoCrossDb(10 * Math.Log10((GainRhcp[i] + 1e-300) / (GainLhcp[i] + 1e-300))));
            worstAr = Math.Max(worstAr, ar);
            sumAr += ar;
            sumR += GainRhcp[i];
            sumL += GainLhcp[i];
            if (GainRhcp[i] > GainLhcp[i]) rightCount++;
        }
        return new FrequencySummary(FrequencyHz, ImpedanceOhm, Vswr(ImpedanceOhm),
            worstScore, sumScore / n, worstAr, sumAr / n,
            2 * rightCount >= n ? PolarizationSense.Rhcp : PolarizationSense.Lhcp,
            Db(sumR / n), Db(sumL / n));
    }

    internal static double Db(double ratio) => ratio > 1e-30 ? 10 * Math.Log10(ratio) : -300;
}

/// <summary>
/// One frequency of an evaluation. Scores are the axial ratio in the wanted sense
/// (<see cref="AxialRatioScore"/>); plain AR values ignore the sense. Gains are the power mean
/// over the directions, in dBic.
/// </summary>
public sealed record FrequencySummary(
    double FrequencyHz,
    Complex ImpedanceOhm,
    double Vswr50,
    double WorstScoreDb,
    double MeanScoreDb,
    double WorstAxialRatioDb,
    double MeanAxialRatioDb,
    PolarizationSense Sense,
    double GainRhcpDbic,
    double GainLhcpDbic)
{
    public double GainDbic(Sense sense) => sense == Model.Sense.Rhcp ? GainRhcpDbic : GainLhcpDbic;
}
