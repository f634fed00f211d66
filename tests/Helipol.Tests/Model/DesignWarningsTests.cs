using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Tests.Model;

public class DesignWarningsTests
{
    private static readonly string Ridge = File.ReadAllText(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"));

    private static IReadOnlyList<DesignWarning> WarningsOf(string text)
    {
        var doc = SpecReader.ReadText(text, "w.yaml", TestPaths.Designs);
        return DesignWarnings.For(doc, DesignResolver.Resolve(doc));
    }

    [Fact]
    public void DemoDesignsRaiseNoWarnings()
    {
        foreach (var path in TestPaths.DemoDesigns)
        {
            var doc = SpecReader.ReadFile(path);
            Assert.Empty(DesignWarnings.For(doc, DesignResolver.Resolve(doc)));
        }
    }

    [Fact]
    public void ThickWireForTheWavelengthIsFlagged()
    {
        // Thin-wire kernel needs a ≪ λ (Harrington, ch. 4): 2.4 mm wire at 5.8 GHz has a = 1.2 mm > 0.01 λ = 0.52 mm.
        var warnings = WarningsOf(Ridge.Replace("wire: { diameter: 0.8 mm", "wire: { diameter: 2.4 mm"));
        Assert.Contains(warnings, w => w.FieldPath == "polarizer.wire.diameter");
    }

    [Fact]
    public void ElementsAtTheFormerEdgeAreFlagged()
    {
        var warnings = WarningsOf(Ridge.Replace("height: 19 mm", "height: 13 mm"));
        // Column 78 is where "13 mm" starts on line 20 (counted 1-based, as editors do).
        Assert.Equal("w.yaml:20:78: warning: polarizer.former.height: element ends come within 0.15 mm of the former's edge (rise 12.7 mm, height 13 mm); glue and tape hold poorly there",
            Assert.Single(warnings).ToString());
    }

    [Fact]
    public void ElementsBeyondTheWhipAreFlagged()
    {
        var warnings = WarningsOf(Ridge.Replace("centre_height: 0 mm", "centre_height: 10 mm"));
        Assert.Contains(warnings, w => w.FieldPath == "polarizer.centre_height");
    }
}

public class GrooveWarningTests
{
    private static readonly string Ridge = File.ReadAllText(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"));

    private static IReadOnlyList<DesignWarning> WarningsOf(string text)
    {
        var doc = SpecReader.ReadText(text, "w.yaml", TestPaths.Designs);
        return DesignWarnings.For(doc, DesignResolver.Resolve(doc));
    }

    [Fact]
    public void WarningUsesTheGrooveDepthTheSleeveIsDrawnWith() =>
        Assert.Equal(Helipol.Geometry.FormerSleeve.GrooveDepthPerWireDiameter, DesignWarnings.GrooveDepthPerWireDiameter);

    [Fact]
    public void GrooveShallowerThanAPrintLayerIsFlagged()
    {
        // 0.3 mm wire: grooves 0.18 mm deep, under one 0.2 mm layer (common practice, no source).
        var warnings = WarningsOf(Ridge.Replace("wire: { diameter: 0.8 mm", "wire: { diameter: 0.3 mm"));
        var w = Assert.Single(warnings, w => w.FieldPath == "polarizer.wire.diameter");
        Assert.Contains("0.18 mm deep", w.Message);
        // 0.4 mm wire: 0.24 mm, one layer and more: no warning.
        Assert.DoesNotContain(WarningsOf(Ridge.Replace("wire: { diameter: 0.8 mm", "wire: { diameter: 0.4 mm")), x => x.FieldPath == "polarizer.wire.diameter");
    }

    [Fact]
    public void GrooveMuchWiderThanTheWireIsFlagged()
    {
        Assert.Contains(WarningsOf(Ridge.Replace("print_clearance: 0.2 mm", "print_clearance: 0.5 mm")), w => w.FieldPath == "fabrication.print_clearance");
        Assert.DoesNotContain(WarningsOf(Ridge.Replace("print_clearance: 0.2 mm", "print_clearance: 0.4 mm")), w => w.FieldPath == "fabrication.print_clearance");
    }
}
