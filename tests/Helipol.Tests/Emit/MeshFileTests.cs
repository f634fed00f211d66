using System.Buffers.Binary;
using System.Globalization;
using System.IO.Compression;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using Helipol.Geometry;
using Helipol.Tests.Geometry;
using Helipol.Model;

namespace Helipol.Tests.Emit;

/// <summary>
/// former.stl and jig.stl checked by admesh (Debian), which reads binary STL and reports
/// degenerate facets, edges it had to join, facets it added or removed and the enclosed volume;
/// the volume is compared with the solid's analytic volume worked out here from its dimensions.
/// former.3mf is opened as a zip and its model read against the 3MF Core Specification.
/// </summary>
public partial class MeshFileTests
{
    private static Dictionary<string, string> Admesh(byte[] stl)
    {
        OutsideReaders.RequireAdmesh();
        var dir = OutsideReaders.TempFolder();
        var path = Path.Combine(dir, "part.stl");
        File.WriteAllBytes(path, stl);
        // Exact-match checking only (admesh's default without --tolerance/--nearby): nothing is
        // allowed to need repair.
        var (code, stdout) = OutsideReaders.Run(OutsideReaders.Admesh, [path], out var err);
        Directory.Delete(dir, true);
        Assert.True(code == 0, "admesh failed: " + err);
        var result = new Dictionary<string, string>();
        foreach (Match m in AdmeshLine().Matches(stdout))
            result[m.Groups[1].Value.Trim()] = m.Groups[2].Value;
        return result;
    }

    [GeneratedRegex(@"([A-Za-z][A-Za-z ]+?)\s*:\s*(-?[0-9.]+)")]
    private static partial Regex AdmeshLine();

    private static void AssertNothingRepaired(Dictionary<string, string> r)
    {
        foreach (var key in new[] { "Degenerate facets", "Edges fixed", "Facets removed", "Facets added", "Facets reversed", "Backwards edges", "Normals fixed" })
            Assert.True(r.TryGetValue(key, out var v) && v == "0", $"admesh {key}: {r.GetValueOrDefault(key, "missing")}");
        Assert.Equal("1", r["Number of parts"]);
    }

    [SkippableTheory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void FormerStlIsWatertightAndHasTheAnalyticVolume(string name)
    {
        var input = BuildInputs.ByName(name);
        var r = Admesh(RenderedSets.File(name, "former.stl"));
        AssertNothingRepaired(r);
        var sleeve = FormerSleeve.From(new PolarizerGeometry(input));
        var expected = AnalyticFormerVolume(input, sleeve);
        var measured = double.Parse(r["Volume"], CultureInfo.InvariantCulture);
        // The required limit is 0.5 %; the grooves are only about 1 % of the solid, so hold the
        // mesh to 0.1 % as well, which a groove 15 % too wide or too shallow would break. Facets
        // sit within 0.005 mm of the surface; an inscribed polygon loses about 4/3 · sagitta/radius
        // of its area (series of n·sin(2π/n)/2π, any calculus text), under 0.1 % at these radii.
        Assert.InRange(measured / expected, 0.995, 1.005);
        Assert.InRange(measured / expected, 0.999, 1.001);
    }

    /// <summary>
    /// Tube minus lead-in chamfer minus grooves minus sense letter, from the build dimensions:
    /// groove floor at R − d/2 and 0.6·d deep (so the outer radius is D/2 + 0.6·d), bore of cover +
    /// clearance, groove of perpendicular width d + clearance climbing at the helix's pitch on the
    /// floor cylinder (horizontal width W / sin ψ). In cylindrical coordinates the material removed
    /// down to radius r over dφ dz is (Ro² − r²)/2 dφ dz, integrated in closed form over the
    /// groove's piecewise-linear profile.
    /// </summary>
    private static double AnalyticFormerVolume(PolarizerBuildInput i, FormerSleeve sleeve)
    {
        var d = i.WireDiameterMm;
        var R = i.FormerOuterDiameterMm / 2 + d / 2;
        var floor = R - d / 2;
        var depth = 0.6 * d;
        var ro = floor + depth;
        var rb = (i.CoverDiameterMm + i.PrintClearanceMm) / 2;
        var h = i.ElementRiseMm;
        Assert.Equal(ro, sleeve.OuterRadiusMm, 9);
        Assert.Equal(rb, sleeve.BoreRadiusMm, 9);
        Assert.Equal(floor, sleeve.GrooveFloorRadiusMm, 9);

        var tube = Math.PI * (ro * ro - rb * rb) * i.FormerHeightMm;
        var c = sleeve.ChamferMm;
        var r1 = rb + c;
        var chamfer = Math.PI * c / 3 * (r1 * r1 + r1 * rb + rb * rb) - Math.PI * rb * rb * c;

        var theta = Math.Sqrt(i.ElementLengthMm * i.ElementLengthMm - h * h) / R;
        var psi = Math.Atan(h / (theta * floor));
        var alpha = (d + i.PrintClearanceMm) / 2 / Math.Sin(psi) / floor;
        var tau = FormerSleeve.GrooveWallTaperMm / floor;
        // ∫p ds and ∫p² ds over a flat-bottomed profile with linear walls of width τ.
        var p1 = 2 * alpha + tau;
        var p2 = 2 * alpha + 2 * tau / 3;
        double AreaAt(double dd) => ro * dd * p1 - dd * dd / 2 * p2;
        double RunOut(double len) => len * (ro * depth * p1 / 2 - depth * depth / 2 * p2 / 3);
        var groove = AreaAt(depth) * h + RunOut(sleeve.RunOutBelowMm) + RunOut(sleeve.RunOutAboveMm);

        // Sense letter: each sunk lattice point removes depth × pitch² (the integral of a bilinear
        // hat function over its support is one cell's area), at a slightly smaller radius.
        var letter = i.Sense == Sense.Rhcp ? 'R' : 'L';
        var sunk = SenseMark.Glyph(letter).Sum(row => row.Count(ch => ch == '#'));
        var mark = sunk * FormerSleeve.MarkDepthMm * sleeve.Mark.PitchMm * sleeve.Mark.PitchMm * (ro - FormerSleeve.MarkDepthMm / 2) / ro;

        return tube - chamfer - i.ElementCount * groove - mark;
    }

    [SkippableTheory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void JigStlIsWatertightAndHasTheAnalyticVolume(string name)
    {
        var g = new PolarizerGeometry(BuildInputs.ByName(name));
        var r = Admesh(RenderedSets.File(name, "jig.stl"));
        AssertNothingRepaired(r);
        var jig = BendingJig.From(g);
        // The channel runs one element length along its centre line to the stop.
        Assert.Equal(g.Input.ElementLengthMm, jig.StopAngleRad * jig.BendRadiusMm, 9);
        Assert.Equal(g.Input.WireDiameterMm + g.Input.PrintClearanceMm, jig.ChannelWidthMm, 9);
        // Pappus: a section swept round an axis through angle Φ has volume Φ·∫∫ r dr dz; for a
        // rectangle [r1, r2] × [z1, z2] that is Φ·(r2² − r1²)/2·(z2 − z1).
        double Rect(double ra, double rb, double za, double zb) => (rb * rb - ra * ra) / 2 * (zb - za);
        var full = Rect(jig.BendRadiusMm - jig.InnerMarginMm, jig.BendRadiusMm + jig.OuterMarginMm, 0, jig.ThicknessMm);
        var notch = Rect(jig.BendRadiusMm - jig.ChannelWidthMm / 2, jig.BendRadiusMm + jig.ChannelWidthMm / 2, jig.ThicknessMm - jig.ChannelDepthMm, jig.ThicknessMm);
        var expected = jig.StopAngleRad * (full - notch) + (jig.EndAngleRad - jig.StopAngleRad) * full;
        var measured = double.Parse(r["Volume"], CultureInfo.InvariantCulture);
        Assert.InRange(measured / expected, 0.995, 1.005);
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void ThreeMfHoldsTheCorePartsInMillimetresWithTheStlTriangles(string name)
    {
        var stl = RenderedSets.File(name, "former.stl");
        var stlTriangles = BinaryPrimitives.ReadUInt32LittleEndian(stl.AsSpan(80));
        Assert.Equal(84 + 50 * stlTriangles, (uint)stl.Length);
        using var zip = new ZipArchive(new MemoryStream(RenderedSets.File(name, "former.3mf")), ZipArchiveMode.Read);
        // 3MF Core Specification (3MF Consortium), §2 and Open Packaging Conventions (ECMA-376
        // Part 2): content types, root relationships, and a model part the relationship targets.
        XNamespace ct = "http://schemas.openxmlformats.org/package/2006/content-types";
        var types = XDocument.Load(zip.GetEntry("[Content_Types].xml")!.Open());
        Assert.Contains(types.Root!.Elements(ct + "Default"), e => (string?)e.Attribute("Extension") == "model"
            && (string?)e.Attribute("ContentType") == "application/vnd.ms-package.3dmanufacturing-3dmodel+xml");
        XNamespace rel = "http://schemas.openxmlformats.org/package/2006/relationships";
        var rels = XDocument.Load(zip.GetEntry("_rels/.rels")!.Open());
        var target = rels.Root!.Elements(rel + "Relationship")
            .Single(e => (string?)e.Attribute("Type") == "http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel");
        var modelEntry = zip.GetEntry(((string)target.Attribute("Target")!).TrimStart('/'))!;
        XNamespace core = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
        var model = XDocument.Load(modelEntry.Open());
        Assert.Equal(core + "model", model.Root!.Name);
        Assert.Equal("millimeter", (string?)model.Root.Attribute("unit"));
        var mesh = model.Root.Element(core + "resources")!.Element(core + "object")!.Element(core + "mesh")!;
        var vertexCount = mesh.Element(core + "vertices")!.Elements(core + "vertex").Count();
        var triangles = mesh.Element(core + "triangles")!.Elements(core + "triangle").ToList();
        Assert.Equal((int)stlTriangles, triangles.Count);
        Assert.All(triangles, t => Assert.InRange(int.Parse((string)t.Attribute("v1")!, CultureInfo.InvariantCulture), 0, vertexCount - 1));
        Assert.NotNull(model.Root.Element(core + "build")!.Element(core + "item"));
    }
}
