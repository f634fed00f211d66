using System.Globalization;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Refuses, before any field solve, a pinned geometry the thin-wire model cannot trust or a
/// builder cannot make: segments shorter than about two wire radii, wires that touch or cross,
/// elements inside the cover, a search range with no buildable former. The engine's mesh checks
/// (Harrington, Field Computation by Moment Methods, ch. 4: the reduced thin-wire kernel wants segments
/// ≫ radius; the engine's tube kernel on each wire's own pairs relaxes that to two radii) run on the
/// mesh alone, so nothing is solved to find the fault.
/// </summary>
public static class ModelGuard
{
    /// <summary>Null when the design may be solved; otherwise a "found ..., allowed ..." phrase and the key to change.</summary>
    public static (string KeyPath, string Found, string Allowed)? Refusal(PolarizerDesign design, double calibrationFactor)
    {
        var p = design.Polarizer;
        var limits = FabricationLimits.For(design);
        string Mm(double m) => (m * 1e3).ToString("0.###", CultureInfo.InvariantCulture) + " mm";

        if (p.Former.OuterDiameterM is null && design.Solve.Search.OuterDiameterMaxM <= p.Former.BoreM + 2 * p.Wire.DiameterM)
            return (Keys.SolveSearchOuterDiameter, $"a largest former of {Mm(design.Solve.Search.OuterDiameterMaxM)}",
                $"more than bore + 2 × wire diameter ({Mm(p.Former.BoreM + 2 * p.Wire.DiameterM)}) so the elements sit outside the cover");

        if (p.ElementCount is null || p.ElementLengthM is null || p.ElementRiseM is null || p.Former.OuterDiameterM is null)
            return null; // the search skips unbuildable candidates and says so if none remain
        var layout = PinnedLayout.Require(design);
        if (limits.Check(layout) is { } violation)
            return (ViolationKey(design, violation), $"pinned elements that cannot be built ({violation})", "a layout within the fabrication limits");

        var build = PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, Winding.Right, calibrationFactor);
        double maxF = HighestFrequencyHz(design);
        try
        {
            MeshedModel.Create(PolarizerWires.Build(build, maxF), maxF);
        }
        catch (ModelException ex)
        {
            return (MeshKey(design, ex.WireIndices), $"a geometry the thin-wire model refuses ({ex.Message})",
                "wires that keep clear of each other with segments of at least two radii");
        }
        return null;
    }

    /// <summary>
    /// The key a user would change for a mesh fault: wires[0] is the whip (PolarizerWires), so a
    /// fault on it alone is its diameter; a fault on one element alone is the element wire's
    /// diameter, or its height on a monopole when it dips to the ground; elements touching each
    /// other are a matter of their length.
    /// </summary>
    private static string MeshKey(PolarizerDesign design, IReadOnlyList<int> wires)
    {
        var p = design.Polarizer;
        if (wires.Count == 1 && wires[0] == 0) return Keys.WhipDiameter;
        if (wires.Contains(0)) return Keys.PolarizerFormerBore;
        if (wires.Count == 1)
        {
            var nearGround = design.Whip.Kind == WhipKind.Monopole && p.CentreHeightM - (p.ElementRiseM ?? 0) / 2 < 2 * p.Wire.RadiusM;
            return nearGround ? Keys.PolarizerCentreHeight : Keys.PolarizerWireDiameter;
        }
        return Keys.PolarizerElementLength;
    }

    /// <summary>The key a user would change for a layout outside the fabrication limits.</summary>
    private static string ViolationKey(PolarizerDesign design, FabricationViolation violation) => violation.Cause switch
    {
        FabricationCause.Rise => Keys.PolarizerElementRise,
        FabricationCause.Wire => Keys.PolarizerWireDiameter,
        FabricationCause.Ground => Keys.PolarizerCentreHeight,
        _ => Keys.PolarizerElementLength,
    };

    /// <summary>The highest frequency any verb solves: the top of the reported sweep.</summary>
    public static double HighestFrequencyHz(PolarizerDesign design) =>
        design.Band.HighHz + design.Solve.Sweep.SpanFraction * design.Band.CenterHz;
}
