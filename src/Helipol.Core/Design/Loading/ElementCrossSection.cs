namespace Helipol.Design.Loading;

/// <summary>
/// The cross-section of one element wire as built, in SI units, wire centre at the origin and the
/// former below it (−y). Stated model (common practice, no source: it is how the parts sit):
/// <list type="bullet">
/// <item>The former is a slab under the wire, its top face at y = −a (the wire rests on it),
/// <see cref="FormerDepthM"/> thick and ±<see cref="FormerHalfWidthM"/> wide: the former's wall,
/// flattened (its curvature radius is tens of wire radii).</item>
/// <item>A printed sleeve holds the wire in a groove: the floor at y = −a, the walls at
/// |x| = <see cref="GrooveHalfWidthM"/> up to the sleeve surface <see cref="GrooveDepthM"/> above the floor.</item>
/// <item>Glue of thickness t_g coats the wire's top half (a ≤ r ≤ a + t_g) and fills down to the
/// floor beside it (|x| ≤ a + t_g): the fillets in the cusps between wire and former.</item>
/// <item>The wrap, t thick, conforms over the wire (and glue) and lies on the former beside it. It
/// leaves the wire's side along the tangent to the point where it meets the former at
/// |x| = <see cref="TentDistanceM"/> from the wire axis (null: at the wire's own side, hugging);
/// under the tent is air.</item>
/// </list>
/// </summary>
public sealed record ElementCrossSection(
    double WireRadiusM,
    double FormerPermittivity,
    double FormerDepthM,
    double FormerHalfWidthM,
    double? GrooveHalfWidthM,
    double GrooveDepthM,
    double GluePermittivity,
    double GlueThicknessM,
    double WrapPermittivity,
    double WrapThicknessM,
    double? TentDistanceM)
{
    /// <summary>The same wire in air.</summary>
    public static ElementCrossSection Bare(double wireRadiusM) => new(wireRadiusM, 1, 0, 0, null, 0, 1, 0, 1, 0, null);

    /// <summary>True when nothing but air surrounds the wire.</summary>
    public bool IsAir => (FormerPermittivity == 1 || FormerDepthM <= 0) && (GluePermittivity == 1 || GlueThicknessM <= 0) && (WrapPermittivity == 1 || WrapThicknessM <= 0);

    /// <summary>Only the wrap (glue and former made air): its share of the loading.</summary>
    public ElementCrossSection WrapOnly => this with { FormerPermittivity = 1, GluePermittivity = 1 };

    /// <summary>Only the glue.</summary>
    public ElementCrossSection GlueOnly => this with { FormerPermittivity = 1, WrapPermittivity = 1 };

    /// <summary>Only the former.</summary>
    public ElementCrossSection FormerOnly => this with { GluePermittivity = 1, WrapPermittivity = 1 };

    /// <summary>
    /// The key the loading cache is indexed by: every length rounded to steps of 2 % (log scale: at most 1 % off, which moves S by well under 1 %, and keeps the Monte Carlo's ±30 % wrap spread to some thirty solves)
    /// and every permittivity to 0.001. The solve itself runs on the rounded values, so a key
    /// always stands for the same result whichever caller computed it first.
    /// </summary>
    public ElementCrossSection Rounded() => this with
    {
        WireRadiusM = RoundLength(WireRadiusM), FormerDepthM = RoundLength(FormerDepthM), FormerHalfWidthM = RoundLength(FormerHalfWidthM),
        GrooveHalfWidthM = GrooveHalfWidthM is { } g ? RoundLength(g) : null, GrooveDepthM = RoundLength(GrooveDepthM),
        GlueThicknessM = RoundLength(GlueThicknessM), WrapThicknessM = RoundLength(WrapThicknessM),
        TentDistanceM = TentDistanceM is { } d ? RoundLength(d) : null,
        FormerPermittivity = Math.Round(FormerPermittivity, 3), GluePermittivity = Math.Round(GluePermittivity, 3), WrapPermittivity = Math.Round(WrapPermittivity, 3),
    };

    private static readonly double LogStep = Math.Log(1.02);

    private static double RoundLength(double m) => m <= 0 ? 0 : Math.Exp(Math.Round(Math.Log(m) / LogStep) * LogStep);
}
