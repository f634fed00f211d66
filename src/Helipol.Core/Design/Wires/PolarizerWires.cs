using Helipol.Engine;
using Helipol.Model;
using Wire = Helipol.Engine.Wire;

namespace Helipol.Design;

/// <summary>
/// A <see cref="PolarizerBuild"/> as engine wires, by the geometry convention: a dipole whip along
/// z centred at z = 0 and fed by a delta gap at its centre, or a monopole standing on a perfect
/// ground at z = 0 and fed at its base; the elements as helical polylines with their metal and
/// their effective coating. The whip is a perfect conductor: its own loss is the same with and
/// without the polarizer and does not change the polarization.
/// </summary>
public static class PolarizerWires
{
    /// <summary>Feed point of the whip, m.</summary>
    public static Vector3 FeedPoint => new(0, 0, 0);

    public static WireModel Build(PolarizerBuild b, double maxFrequencyHz, SegmentationOptions? options = null)
    {
        options ??= SegmentationOptions.Default;
        var wires = new List<Wire> { Whip(b.WhipKind, b.WhipLengthM, b.WhipRadiusM) };
        Conductor metal = b.WireConductivitySPerM is { } sigma ? new LossyConductor(sigma, b.WireRelativePermeability) : PerfectConductor.Instance;
        var coating = b.Surroundings.CoatingFor(b.WireRadiusM);
        foreach (var e in b.Elements)
        {
            int edges = ElementHelix.EdgeCount(e, b.AxisRadiusM, b.WireRadiusM, maxFrequencyHz, options);
            wires.Add(new Wire(ElementHelix.Points(e, b.AxisRadiusM, b.CentreHeightM, b.Winding, edges), b.WireRadiusM, metal, coating));
        }
        return new WireModel(wires, Ground(b.WhipKind), new[] { new VoltageSource(FeedPoint, 1) });
    }

    /// <summary>The whip alone, for the bare-whip comparison.</summary>
    public static WireModel BareWhip(WhipKind kind, double lengthM, double radiusM) =>
        new(new[] { Whip(kind, lengthM, radiusM) }, Ground(kind), new[] { new VoltageSource(FeedPoint, 1) });

    private static GroundPlane Ground(WhipKind kind) => kind == WhipKind.Monopole ? GroundPlane.PerfectAtZ0 : GroundPlane.None;

    private static Wire Whip(WhipKind kind, double lengthM, double radiusM) => kind == WhipKind.Monopole
        ? new Wire(new[] { new Vector3(0, 0, 0), new Vector3(0, 0, lengthM) }, radiusM, PerfectConductor.Instance)
        // The centre is a polyline vertex so the feed always finds a node there.
        : new Wire(new[] { new Vector3(0, 0, -lengthM / 2), new Vector3(0, 0, 0), new Vector3(0, 0, lengthM / 2) }, radiusM, PerfectConductor.Instance);
}
