using Helipol.Model;
using Helipol.Model.Materials;

namespace Helipol.Tests.Model;

public class DesignResolverTests
{
    private static PolarizerDesign Ridge => DesignResolver.ReadFile(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"));

    [Fact]
    public void WavelengthIsSpeedOfLightOverFrequency()
    {
        // λ = c/f with c = 299 792 458 m/s exactly (SI Brochure, 9th ed.): 5.8 GHz → 51.688 mm.
        Assert.Equal(299_792_458.0 / 5.8e9, Ridge.Band.WavelengthM, 15);
    }

    [Fact]
    public void GeometryConventionGivesAxisRadiusAndArcAngle()
    {
        // Convention of the design file: axis radius = outer/2 + wire/2; arc angle = sqrt(L² − rise²)/radius.
        // 28 mm former, 0.8 mm wire → 14.4 mm; L = 0.63 in = 16.002 mm, rise = 0.5 in = 12.7 mm (NIST SP 811).
        var layout = Ridge.Practice;
        Assert.Equal(0.0144, layout.AxisRadiusM, 12);
        var expected = Math.Sqrt(16.002 * 16.002 - 12.7 * 12.7) / 14.4;
        Assert.Equal(expected, layout.ArcAngleRad, 9);
    }

    [Fact]
    public void MaterialsAndOverridesAreResolved()
    {
        var p = Ridge.Polarizer;
        // Carbon steel has no handbook value in our table: the row must say so.
        Assert.Contains("from memory", p.Wire.ConductivitySPerM!.Source);
        Assert.Equal(0.15e-3, p.Wrap!.LayerThicknessM.Value, 12);
        Assert.Equal(SourcedValue.DesignFile, p.Wrap.LayerThicknessM.Source);
        // Pozar, Microwave Engineering, appendix: polystyrene foam εr about 1.03.
        Assert.Equal(1.03, p.Former.RelativePermittivity.Value, 6);
    }

    [Fact]
    public void BandEdgesDefaultToOneAndAHalfPercent()
    {
        var farm = DesignResolver.ReadFile(Path.Combine(TestPaths.Designs, "farm-survey-2g4.yaml"));
        Assert.True(farm.Band.EdgesGiven);
        var text = File.ReadAllText(Path.Combine(TestPaths.Designs, "farm-survey-2g4.yaml"))
            .Replace("{ center: 2.44 GHz, low: 2.4 GHz, high: 2.48 GHz }", "{ center: 2.44 GHz }");
        var doc = Helipol.Spec.SpecReader.ReadText(text, "farm.yaml", TestPaths.Designs);
        var band = DesignResolver.Resolve(doc).Band;
        Assert.False(band.EdgesGiven);
        Assert.Equal(2.44e9 * 0.985, band.LowHz, 0);
        Assert.Equal(2.44e9 * 1.015, band.HighHz, 0);
    }

    [Fact]
    public void MonopoleTakesTheElevatedWindowByDefault()
    {
        // Over a perfect ground the horizontal field vanishes at grazing (image theory), so the
        // default window starts above the horizon: 10 deg to 50 deg.
        var text = File.ReadAllText(Path.Combine(TestPaths.Designs, "station-1g3-monopole.yaml"))
            .Replace("solve:\n  elevations: { from: 10 deg, to: 50 deg }\n", "");
        var design = DesignResolver.Resolve(Helipol.Spec.SpecReader.ReadText(text, "m.yaml", TestPaths.Designs));
        Assert.Equal(10 * Math.PI / 180, design.Solve.ElevationFromRad, 12);
        Assert.Equal(50 * Math.PI / 180, design.Solve.ElevationToRad, 12);
    }

    [Fact]
    public void EveryMaterialValueCarriesASource()
    {
        foreach (var m in MaterialTable.Conductors)
        {
            Assert.False(string.IsNullOrWhiteSpace(m.RelativePermeability.Source), m.Key);
            if (m.ConductivitySPerM is { } s) Assert.False(string.IsNullOrWhiteSpace(s.Source), m.Key);
        }
        foreach (var m in MaterialTable.Formers.Concat(MaterialTable.Wraps).Concat(MaterialTable.Glues))
        {
            Assert.False(string.IsNullOrWhiteSpace(m.RelativePermittivity.Source), m.Key);
            Assert.False(string.IsNullOrWhiteSpace(m.LossTangent.Source), m.Key);
        }
    }

    [Theory]
    [InlineData("copper", 5.813e7)] // Pozar, Microwave Engineering, appendix F
    [InlineData("brass", 2.56e7)]   // Pozar, appendix F
    [InlineData("stainless", 1.1e6)] // Pozar, appendix F
    public void ConductivitiesMatchTheHandbook(string key, double sigma) =>
        Assert.Equal(sigma, MaterialTable.Conductor(key).ConductivitySPerM!.Value, 0);

    [Fact]
    public void EveryDesignKeyMaterialExistsInTheTable()
    {
        Assert.All(Helipol.Spec.DesignKeys.WireMaterials, k => MaterialTable.Conductor(k));
        Assert.All(Helipol.Spec.DesignKeys.FormerMaterials, k => MaterialTable.Former(k));
        Assert.All(Helipol.Spec.DesignKeys.WrapMaterials, k => Assert.NotNull(MaterialTable.Wrap(k).TypicalThicknessM));
        Assert.All(Helipol.Spec.DesignKeys.GlueMaterials, k => MaterialTable.Glue(k));
    }
}
