using System.Globalization;
using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// Refuses, before any field solve, a pinned geometry the thin-wire model cannot trust or a
/// builder cannot make: segments shorter than about four wire radii, wires that touch or cross,
/// elements inside the cover, a search range with no buildable former. The engine's mesh checks
/// (Harrington, Field Computation by Moment Methods, ch. 4: thin-wire kernel valid for segment
/// length ≫ radius) run on the mesh alone, so nothing is solved to find the fault.
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
            return ("solve.search.outer_diameter", $"a largest former of {Mm(design.Solve.Search.OuterDiameterMaxM)}",
                $"more than bore + 2 × wire diameter ({Mm(p.Former.BoreM + 2 * p.Wire.DiameterM)}) so the elements sit outside the cover");

        if (p.ElementCount is null || p.ElementLengthM is null || p.ElementRiseM is null || p.Former.OuterDiameterM is null)
            return null; // the search skips unbuildable candidates and says so if none remain
        var layout = PinnedLayout.Require(design);
        if (limits.Violation(layout) is { } violation)
            return ("polarizer.element_length", $"pinned elements that cannot be built ({violation})", "a layout within the fabrication limits");

        var build = PolarizerBuild.From(design, layout.Count, layout.LengthM, layout.RiseM, layout.OuterDiameterM, Winding.Right, calibrationFactor);
        double maxF = HighestFrequencyHz(design);
        try
        {
            MeshedModel.Create(PolarizerWires.Build(build, maxF), maxF);
        }
        catch (ModelException ex)
        {
            return ("polarizer.element_length", $"a geometry the thin-wire model refuses ({ex.Message})",
                "wires that keep clear of each other with segments of at least four radii");
        }
        return null;
    }

    /// <summary>The highest frequency any verb solves: the top of the reported sweep.</summary>
    public static double HighestFrequencyHz(PolarizerDesign design) =>
        design.Band.HighHz + design.Solve.Sweep.SpanFraction * design.Band.CenterHz;
}
