using System.Globalization;
using Helipol.Geometry;
using Helipol.Model;
using Xunit;

namespace Helipol.Tests.Geometry;

/// <summary>
/// A fabrication setting left out of a <see cref="PolarizerBuildInput"/> takes the same value as the
/// design-file key left out of a design (the table in Spec/DesignKeys), so the library and the
/// command line cannot drift apart.
/// </summary>
public sealed class BuildInputDefaultsTests
{
    private static readonly PolarizerBuildInput Bare = new()
    {
        DesignName = "x", Sense = Sense.Rhcp, Winding = Winding.Right, ElementCount = 5, ElementLengthMm = 16, ElementRiseMm = 12.7,
        CentreHeightMm = 10, WireDiameterMm = 0.5, FormerOuterDiameterMm = 28, FormerBoreDiameterMm = 6.4, FormerHeightMm = 20, CoverDiameterMm = 6,
    };

    /// <summary>The number in a table default such as "300 mm" or "6".</summary>
    private static double TableDefault(DesignKey key) =>
        double.Parse(key.Field.Default!.Split(' ')[0], CultureInfo.InvariantCulture);

    public static TheoryData<string, double, double> Pairs() => new()
    {
        { Keys.FabricationKerf.Path, Bare.KerfMm, TableDefault(Keys.FabricationKerf) },
        { Keys.FabricationRings.Path, Bare.RingCount, TableDefault(Keys.FabricationRings) },
        { Keys.FabricationBoardWidth.Path, Bare.BoardWidthMm, TableDefault(Keys.FabricationBoardWidth) },
        { Keys.FabricationBoardHeight.Path, Bare.BoardHeightMm, TableDefault(Keys.FabricationBoardHeight) },
        { Keys.FabricationBoardThickness.Path, Bare.BoardThicknessMm, TableDefault(Keys.FabricationBoardThickness) },
        { Keys.FabricationPrintClearance.Path, Bare.PrintClearanceMm, TableDefault(Keys.FabricationPrintClearance) },
        { Keys.FabricationDpi.Path, Bare.Dpi, TableDefault(Keys.FabricationDpi) },
        { Keys.ToleranceElementLength.Path, Bare.LengthToleranceMm, TableDefault(Keys.ToleranceElementLength) },
        { Keys.ToleranceElementRise.Path, Bare.RiseToleranceMm, TableDefault(Keys.ToleranceElementRise) },
    };

    [Theory]
    [MemberData(nameof(Pairs))]
    public void A_left_out_setting_is_the_design_file_default(string key, double buildInput, double table) =>
        Assert.True(buildInput == table, $"{key}: build input default {buildInput}, design file default {table}");

    [Fact]
    public void Paper_default_is_the_design_file_default() =>
        Assert.Equal(Keys.FabricationPaper.Field.Default, ChoiceWords.Paper.Word(Bare.Paper));
}
