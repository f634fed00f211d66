namespace Helipol.Design;

/// <summary>
/// Axial ratio in the wanted sense, extended so a search always sees a slope.
///
/// With ρ = |E_co|/|E_cross| (wanted over unwanted circular component, IEEE Std 145 split),
/// AR = (ρ + 1)/(ρ − 1). That is infinite at ρ = 1 (linear) and falls again for the wrong sense,
/// which would let an optimizer mistake a wrong-sense design for a good one. The score is AR in dB
/// while that is below <see cref="CapDb"/>; beyond it, the score grows linearly (1 dB per dB) as the
/// co/cross ratio falls, through linear and on into the wrong sense. So the score is continuous and
/// strictly decreasing in the co/cross ratio, and any wrong-sense direction scores worse than any
/// right-sense one.
/// </summary>
public static class AxialRatioScore
{
    /// <summary>Where true AR hands over to the linear extension, dB.</summary>
    public const double CapDb = 30;

    /// <summary>Co/cross power ratio (dB) at which AR equals <see cref="CapDb"/>: about 0.55 dB.</summary>
    public static readonly double CoCrossAtCapDb = CoCrossDbFromAxialRatioDb(CapDb);

    /// <summary>Score from the co- and cross-polar power (any common scale), dB.</summary>
    public static double Score(double coPower, double crossPower)
    {
        const double tiny = 1e-300;
        double xpd = 10 * Math.Log10((coPower + tiny) / (crossPower + tiny));
        if (xpd >= CoCrossAtCapDb) return AxialRatioDbFromCoCrossDb(xpd);
        return CapDb + (CoCrossAtCapDb - xpd);
    }

    /// <summary>AR (dB) of an ellipse whose circular components differ by <paramref name="coCrossDb"/> (&gt; 0): 20 log10((ρ+1)/(ρ−1)), ρ = 10^(dB/20).</summary>
    public static double AxialRatioDbFromCoCrossDb(double coCrossDb)
    {
        double rho = Math.Pow(10, Math.Abs(coCrossDb) / 20);
        if (rho - 1 < 1e-15) return double.PositiveInfinity;
        return 20 * Math.Log10((rho + 1) / (rho - 1));
    }

    /// <summary>Inverse of <see cref="AxialRatioDbFromCoCrossDb"/>: ρ = (r + 1)/(r − 1), r = 10^(AR/20).</summary>
    public static double CoCrossDbFromAxialRatioDb(double axialRatioDb)
    {
        double r = Math.Pow(10, axialRatioDb / 20);
        return 20 * Math.Log10((r + 1) / (r - 1));
    }
}
