using System.Globalization;
using Helipol.Model;

namespace Helipol.Geometry;

/// <summary>
/// Refuses inputs no object can be made from. The design file is checked long before this; these
/// are the geometric limits only, named in the builder's terms.
/// </summary>
internal static class BuildInputCheck
{
    public static void ThrowIfUnbuildable(PolarizerBuildInput i)
    {
        // The model's winding has a third value, auto (the solver picks); an object is wound one way.
        if (i.Winding is not (Winding.Left or Winding.Right))
            throw new ArgumentException($"winding: found {ChoiceWords.Winding.Word(i.Winding)}, allowed left or right (the solver resolves auto before fabrication)");
        Require(i.ElementCount is >= 1 and <= 64, "element count", i.ElementCount, "1 to 64");
        Require(i.ElementLengthMm > 0, "element length", i.ElementLengthMm, "> 0 mm");
        Require(i.ElementRiseMm > 0 && i.ElementRiseMm < i.ElementLengthMm, "element rise", i.ElementRiseMm, "between 0 and the element length");
        Require(i.WireDiameterMm > 0, "wire diameter", i.WireDiameterMm, "> 0 mm");
        Require(i.FormerBoreDiameterMm > 0 && i.FormerBoreDiameterMm < i.FormerOuterDiameterMm, "former bore", i.FormerBoreDiameterMm, "between 0 and the outer diameter");
        Require(i.CoverDiameterMm > 0 && i.CoverDiameterMm + i.PrintClearanceMm < i.FormerOuterDiameterMm, "cover diameter", i.CoverDiameterMm, "smaller than the former's outer diameter less the print clearance");
        Require(i.FormerHeightMm > 0, "former height", i.FormerHeightMm, "> 0 mm");
        Require(i.CentreHeightMm - i.ElementRiseMm / 2 >= -1e-9 && i.CentreHeightMm + i.ElementRiseMm / 2 <= i.FormerHeightMm + 1e-9,
            "centre height", i.CentreHeightMm, "so that the element stays on the former (rise/2 to height − rise/2)");
        Require(i.KerfMm >= 0, "kerf", i.KerfMm, ">= 0 mm");
        Require(i.RingCount >= 1, "ring count", i.RingCount, ">= 1");
        Require(i.BoardWidthMm > 0 && i.BoardHeightMm > 0, "board size", i.BoardWidthMm, "> 0 mm");
        Require(i.PrintClearanceMm >= 0 && i.DrillClearanceMm >= 0, "clearance", i.PrintClearanceMm, ">= 0 mm");
        Require(i.Dpi is >= 72 and <= 1200, "dpi", i.Dpi, "72 to 1200");
        Require(i.LengthToleranceMm >= 0 && i.RiseToleranceMm >= 0, "tolerance", i.LengthToleranceMm, ">= 0 mm");
    }

    private static void Require(bool ok, string what, double found, string allowed)
    {
        if (!ok)
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture, $"{what}: found {found}, allowed {allowed}"));
    }
}
