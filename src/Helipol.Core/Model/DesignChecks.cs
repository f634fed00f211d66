using Helipol.Spec;

namespace Helipol.Model;

/// <summary>
/// Checks across keys: things that cannot be built or cannot work, each reported at the key a user
/// would change. Per-key limits (ranges, units) were already checked by the Spec layer.
/// </summary>
public static class DesignChecks
{
    /// <summary>Smallest board (width, height) in mm that holds one ring of this outer diameter.</summary>
    public static (double WidthMm, double HeightMm) BoardNeededMm(double outerDiameterMm, double kerfMm)
    {
        var cell = outerDiameterMm + kerfMm + 2 * RingBoardLayout.LabelMarginMm;
        return (cell + 2 * RingBoardLayout.BoardMarginMm, cell + RingBoardLayout.TextBandMm + 2 * RingBoardLayout.BoardMarginMm);
    }

    public static void Check(SpecDocument doc, PolarizerDesign design, SpecErrors errors)
    {
        var p = design.Polarizer;
        var former = p.Former;
        string L(double m) => QuantityKind.Length.FormatSi(m);

        // The former must slide over the whip (or its cover).
        var fitsOver = design.Whip.CoverDiameterM ?? design.Whip.DiameterM;
        if (design.Whip.CoverDiameterM is { } cover && cover <= design.Whip.DiameterM)
            errors.Add(doc.MarkOf(Keys.WhipCoverDiameter), Keys.WhipCoverDiameter, doc.WrittenOf(Keys.WhipCoverDiameter), $"larger than {Keys.WhipDiameter} ({doc.WrittenOf(Keys.WhipDiameter)})");
        else if (fitsOver > former.BoreM)
        {
            var key = design.Whip.CoverDiameterM is null ? Keys.WhipDiameter : Keys.WhipCoverDiameter;
            errors.Add(doc.MarkOf(key), key, doc.WrittenOf(key), $"at most {Keys.PolarizerFormerBore} ({doc.WrittenOf(Keys.PolarizerFormerBore)}) so the former slides over it");
        }

        if (former.OuterDiameterM is { } outer)
        {
            if (former.BoreM >= outer)
                errors.Add(doc.MarkOf(Keys.PolarizerFormerBore), Keys.PolarizerFormerBore, doc.WrittenOf(Keys.PolarizerFormerBore),
                    $"smaller than {Keys.PolarizerFormerOuterDiameter} ({doc.WrittenOf(Keys.PolarizerFormerOuterDiameter)})");
            else
            {
                var wall = (outer - former.BoreM) / 2;
                if (p.Wire.DiameterM >= wall)
                    errors.Add(doc.MarkOf(Keys.PolarizerWireDiameter), Keys.PolarizerWireDiameter, doc.WrittenOf(Keys.PolarizerWireDiameter),
                        $"thinner than the former wall ({L(wall)} = (outer_diameter − bore)/2)");
            }
        }

        if (p.ElementRiseM is { } rise)
        {
            if (p.ElementLengthM is { } length && rise >= length)
                errors.Add(doc.MarkOf(Keys.PolarizerElementRise), Keys.PolarizerElementRise, doc.WrittenOf(Keys.PolarizerElementRise),
                    $"less than {Keys.PolarizerElementLength} ({doc.WrittenOf(Keys.PolarizerElementLength)}): a wire cannot climb more than its length");
            else if (rise > former.HeightM)
                errors.Add(doc.MarkOf(Keys.PolarizerElementRise), Keys.PolarizerElementRise, doc.WrittenOf(Keys.PolarizerElementRise),
                    $"at most {Keys.PolarizerFormerHeight} ({doc.WrittenOf(Keys.PolarizerFormerHeight)}) so the elements stay on the former");
        }

        var layout = design.Practice;
        if (design.Whip.Kind == WhipKind.Monopole && p.CentreHeightM - layout.RiseM / 2 < p.Wire.RadiusM)
            errors.Add(doc.MarkOf(Keys.PolarizerCentreHeight), Keys.PolarizerCentreHeight, doc.WrittenOf(Keys.PolarizerCentreHeight),
                $"at least {L(layout.RiseM / 2 + p.Wire.RadiusM)} on a monopole so the elements (rise {L(layout.RiseM)}) stay above the ground plane");

        // Elements touching one another: only decidable when the user pinned length and rise.
        if (p.ElementLengthM is not null && p.ElementRiseM is not null && layout.RiseM < layout.LengthM)
        {
            var gap = ElementClearance.MinimumAxisDistanceM(layout);
            if (gap < p.Wire.DiameterM)
                errors.Add(doc.MarkOf(Keys.PolarizerElementLength), Keys.PolarizerElementLength, doc.WrittenOf(Keys.PolarizerElementLength),
                    $"elements that keep clear of each other: {layout.Count} elements of this length and rise come within {L(gap)} of each other, less than the wire diameter ({L(p.Wire.DiameterM)})");
        }

        // A former must fit on the board it is cut from, as the ring templates nest it: the ring
        // with half a kerf and a label margin round it, a text band under it, inside the board's
        // margins (RingBoardLayout, which Geometry/RingTemplates.cs draws with). An auto former may be
        // searched up to the top of its range.
        var outerMm = (former.OuterDiameterM ?? design.Solve.Search.OuterDiameterMaxM) * 1e3;
        var (needWidthMm, needHeightMm) = BoardNeededMm(outerMm, design.Fabrication.KerfMm);
        if (design.Fabrication.BoardWidthMm < needWidthMm || design.Fabrication.BoardHeightMm < needHeightMm)
            errors.Add(doc.MarkOf(Keys.FabricationBoard), Keys.FabricationBoard,
                $"a board {doc.WrittenOf(Keys.FabricationBoardWidth)} by {doc.WrittenOf(Keys.FabricationBoardHeight)}",
                $"a board at least {needWidthMm.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)} mm wide by {needHeightMm.ToString("0.##", System.Globalization.CultureInfo.InvariantCulture)} mm high for one ring with its labels");
    }
}
