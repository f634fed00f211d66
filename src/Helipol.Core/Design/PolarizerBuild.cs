using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// One element as laid on the former, in SI units: wire length, vertical rise and the azimuth
/// where it starts (its lower end for a right winding). Every element of a build may differ,
/// which is how the tolerance analysis models hand-made parts.
/// </summary>
public sealed record ElementPlacement(double LengthM, double RiseM, double StartAzimuthRad);

/// <summary>
/// Everything the field model needs to know about one physical polarizer on its whip: the whip,
/// the element wires with their placements, the winding and the dielectric surroundings.
/// Built from a <see cref="PolarizerDesign"/> by <see cref="From"/>, then varied by the search and
/// the tolerance analysis with <c>with</c> expressions.
/// </summary>
public sealed record PolarizerBuild(
    WhipKind WhipKind,
    double WhipLengthM,
    double WhipRadiusM,
    double OuterDiameterM,
    double CentreHeightM,
    Winding Winding,
    IReadOnlyList<ElementPlacement> Elements,
    double WireRadiusM,
    double? WireConductivitySPerM,
    double WireRelativePermeability,
    Surroundings Surroundings)
{
    /// <summary>Radius of the element wire axes: on the former surface (geometry convention).</summary>
    public double AxisRadiusM => OuterDiameterM / 2 + WireRadiusM;

    public int ElementCount => Elements.Count;

    /// <summary>
    /// The frequency the wires are segmented for (see <see cref="MeshDensity"/>), Hz; null meshes
    /// each evaluation for its own highest frequency. Kept through <c>with</c> so every variant of a
    /// design's build shares the design's mesh density.
    /// </summary>
    public double? MeshFrequencyHz { get; init; }

    /// <summary>
    /// A build with <paramref name="count"/> identical elements of length <paramref name="lengthM"/> and rise
    /// <paramref name="riseM"/>, element k starting at azimuth 360°·k/N (geometry convention).
    /// </summary>
    public static PolarizerBuild From(PolarizerDesign design, int count, double lengthM, double riseM, double outerDiameterM,
        Winding winding, double calibrationFactor)
    {
        if (winding == Winding.Auto) throw new ArgumentException("a build needs a definite winding (left or right)", nameof(winding));
        var p = design.Polarizer;
        return new PolarizerBuild(
            design.Whip.Kind, design.Whip.LengthM, design.Whip.RadiusM, outerDiameterM, p.CentreHeightM, winding,
            Uniform(count, lengthM, riseM), p.Wire.RadiusM,
            p.Wire.IsPerfectConductor ? null : p.Wire.ConductivitySPerM!.Value,
            p.Wire.RelativePermeability.Value,
            Surroundings.From(design, calibrationFactor))
        {
            MeshFrequencyHz = MeshDensity.FrequencyHz(design),
        };
    }

    /// <summary>N identical elements evenly spaced around the former.</summary>
    public static IReadOnlyList<ElementPlacement> Uniform(int count, double lengthM, double riseM) =>
        Enumerable.Range(0, count).Select(k => new ElementPlacement(lengthM, riseM, 2 * Math.PI * k / count)).ToArray();

    /// <summary>The same build with every element set to <paramref name="lengthM"/> × <paramref name="riseM"/>.</summary>
    public PolarizerBuild WithElements(int count, double lengthM, double riseM) => this with { Elements = Uniform(count, lengthM, riseM) };

    /// <summary>The mirror image: same elements, opposite winding.</summary>
    public PolarizerBuild Mirrored() => this with { Winding = Winding == Winding.Right ? Winding.Left : Winding.Right };

    /// <summary>Element length of the first element (all equal unless perturbed), m.</summary>
    public double ElementLengthM => Elements[0].LengthM;

    /// <summary>Element rise of the first element (all equal unless perturbed), m.</summary>
    public double ElementRiseM => Elements[0].RiseM;
}
