namespace Helipol.Model;

/// <summary>
/// Practice scaling: the builders' rule of thumb at 5.8 GHz (common practice, no source),
/// scaled by wavelength to other bands (every length × 5.8 GHz / f). It is the search's starting
/// point and a comparison column beside solved values; it is never a solved result.
/// </summary>
public static class PracticeScaling
{
    public const string Label = "practice scaling, not solved";

    /// <summary>The frequency the rule of thumb was stated for (common practice, no source).</summary>
    public const double ReferenceFrequencyHz = 5.8e9;

    /// <summary>About 16 mm (0.62-0.66 in, about ±0.02 in) per element (common practice, no source).</summary>
    public const double ElementLengthAtReferenceM = 16e-3;

    /// <summary>Vertical rise of about 0.5 in = 12.7 mm per element (common practice, no source).</summary>
    public const double ElementRiseAtReferenceM = 12.7e-3;

    /// <summary>3 to 6 elements, 5 preferred (common practice, no source).</summary>
    public const int ElementCount = 5;

    /// <summary>Former height 0.5-0.75 in; we take the middle, 0.625 in (common practice, no source).</summary>
    public const double FormerHeightAtReferenceM = 0.625 * 25.4e-3;

    /// <summary>
    /// The former is cut as a plug with a 1.25 in hole saw (common practice, no source); the plug is
    /// smaller than the saw by the blade's width, about 1.1 in = 28 mm (from memory).
    /// </summary>
    public const double FormerOuterDiameterAtReferenceM = 28e-3;

    /// <summary>Tolerance on element length the builders quote: about ±0.02 in (common practice, no source).</summary>
    public const double ElementLengthToleranceM = 0.02 * 25.4e-3;

    public static double Scale(double frequencyHz) => ReferenceFrequencyHz / frequencyHz;

    public static double ElementLengthM(double frequencyHz) => ElementLengthAtReferenceM * Scale(frequencyHz);

    public static double ElementRiseM(double frequencyHz) => ElementRiseAtReferenceM * Scale(frequencyHz);

    public static double FormerHeightM(double frequencyHz) => FormerHeightAtReferenceM * Scale(frequencyHz);

    public static double FormerOuterDiameterM(double frequencyHz) => FormerOuterDiameterAtReferenceM * Scale(frequencyHz);

    /// <summary>
    /// Elements that descend to the right, seen from outside, give RHCP (common practice, no source).
    /// Seen from outside, increasing azimuth runs to the viewer's right, so "descending to the right"
    /// is our <see cref="Winding.Left"/> (azimuth decreases as the element rises). The solver checks
    /// this with the field model; this is only the builders' rule.
    /// </summary>
    public static Winding WindingFor(Sense sense) => sense == Sense.Rhcp ? Winding.Left : Winding.Right;
}
