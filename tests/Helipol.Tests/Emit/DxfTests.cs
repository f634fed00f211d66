using System.Globalization;
using Helipol.Geometry;
using Helipol.Tests.Geometry;

namespace Helipol.Tests.Emit;

/// <summary>
/// rings.dxf and drill.dxf read back by ezdxf (Debian python3-ezdxf), a DXF library written
/// independently from the AutoCAD DXF Reference: the file must load, its audit must find no
/// errors, the header must say millimetres ($INSUNITS 4, $MEASUREMENT 1 per the DXF Reference's
/// header variables), and the circles and marks read back must sit where the geometry puts them.
/// </summary>
public class DxfTests
{
    // Prints one line per entity: kind layer numbers...; POLYLINE arcs come out through ezdxf's
    // own decomposition of bulges into ARC entities.
    private const string Dump = """
import sys, ezdxf
doc = ezdxf.readfile(sys.argv[1])
auditor = doc.audit()
print("AUDIT", len(auditor.errors), len(auditor.fixes))
print("VERSION", doc.dxfversion)
print("INSUNITS", doc.header.get("$INSUNITS", -1))
print("MEASUREMENT", doc.header.get("$MEASUREMENT", -1))
for layer in doc.layers:
    print("LAYER", layer.dxf.name, layer.dxf.color)
for e in doc.modelspace():
    t = e.dxftype()
    if t == "CIRCLE":
        print("CIRCLE", e.dxf.layer, repr(e.dxf.center.x), repr(e.dxf.center.y), repr(e.dxf.radius))
    elif t == "LINE":
        print("LINE", e.dxf.layer, repr(e.dxf.start.x), repr(e.dxf.start.y), repr(e.dxf.end.x), repr(e.dxf.end.y))
    elif t == "POLYLINE":
        for v in e.virtual_entities():
            if v.dxftype() == "ARC":
                print("ARC", e.dxf.layer, repr(v.dxf.center.x), repr(v.dxf.center.y), repr(v.dxf.radius))
    elif t == "TEXT":
        print("TEXT", e.dxf.layer, e.dxf.text)
""";

    private sealed record Entity(string Kind, string Layer, double[] Numbers, string Text);

    private static List<Entity> Read(byte[] dxf)
    {
        OutsideReaders.RequireEzdxf();
        var dir = OutsideReaders.TempFolder();
        var path = Path.Combine(dir, "drawing.dxf");
        var script = Path.Combine(dir, "dump.py");
        File.WriteAllBytes(path, dxf);
        File.WriteAllText(script, Dump);
        var (code, stdout) = OutsideReaders.Run(OutsideReaders.SystemPython, [script, path], out var err);
        Directory.Delete(dir, true);
        Assert.True(code == 0, "ezdxf could not read the file: " + err);
        return stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(line =>
        {
            var parts = line.Split(' ', 3);
            var nums = parts.Length == 3 && parts[0] is "CIRCLE" or "LINE" or "ARC"
                ? parts[2].Split(' ').Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray()
                : [];
            return new Entity(parts[0], parts.Length > 1 ? parts[1] : "", nums, line);
        }).ToList();
    }

    private static void AssertCleanMillimetreDrawing(List<Entity> e)
    {
        Assert.Equal("AUDIT 0 0", e.Single(x => x.Kind == "AUDIT").Text);
        Assert.Equal("INSUNITS 4", e.Single(x => x.Kind == "INSUNITS").Text);
        Assert.Equal("MEASUREMENT 1", e.Single(x => x.Kind == "MEASUREMENT").Text);
    }

    [SkippableTheory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void RingsDxfAuditsCleanAndMatchesTheGeometry(string name)
    {
        var g = RenderedSets.Geometry(name);
        var e = Read(RenderedSets.File(name, "rings.dxf"));
        AssertCleanMillimetreDrawing(e);
        foreach (var layer in new[] { "CUT", "MARK", "TEXT", "BOARD", "GUIDE" })
            Assert.Contains(e, x => x.Kind == "LAYER" && x.Layer == layer);

        var kerf = g.Input.KerfMm;
        var views = RingTemplates.NestedTopFaces(g).Select(v => (v, "CUT")).Concat(RingTemplates.BottomFaceGuides(g).Select(v => (v, "GUIDE")));
        foreach (var (v, layer) in views)
        {
            // Kerf compensation: bore shrunk by kerf/2, outer contour grown by kerf/2.
            Assert.Contains(e, x => x.Kind == "CIRCLE" && x.Layer == layer && Near(x.Numbers[0], v.Centre.X) && Near(x.Numbers[1], v.Centre.Y)
                && Near(x.Numbers[2], g.Input.FormerBoreDiameterMm / 2 - kerf / 2));
            Assert.Contains(e, x => x.Kind == "ARC" && x.Layer == layer && Near(x.Numbers[0], v.Centre.X) && Near(x.Numbers[1], v.Centre.Y)
                && Near(x.Numbers[2], g.Input.FormerOuterDiameterMm / 2 + kerf / 2));
            foreach (var m in v.Marks)
            {
                // A tick from the contour where the wire crosses; a circle where an element ends inside.
                var at = v.Centre + (m.Kind == FaceMarkKind.Crossing ? m.OnContour : m.Inner);
                var kind = m.Kind == FaceMarkKind.Crossing ? "LINE" : "CIRCLE";
                Assert.Contains(e, x => x.Kind == kind && x.Layer == "MARK" && Near(x.Numbers[0], at.X) && Near(x.Numbers[1], at.Y));
            }
            Assert.Contains(e, x => x.Kind == "TEXT" && x.Text.Contains($"RING {v.RingNumber} {(v.Face == RingFace.Top ? "TOP" : "BOTTOM")}"));
        }
        Assert.Contains(e, x => x.Kind == "TEXT" && x.Text.Contains(g.Input.DesignName.ToUpperInvariant()));
        // Every cut piece lies inside its board.
        foreach (var v in RingTemplates.NestedTopFaces(g))
        {
            var board = RingTemplates.BoardOrigins(g).Single(o => v.Centre.X > o.X && v.Centre.X < o.X + g.Input.BoardWidthMm);
            Assert.InRange(v.Centre.X - v.CutOuterRadiusMm, board.X, board.X + g.Input.BoardWidthMm);
            Assert.InRange(v.Centre.X + v.CutOuterRadiusMm, board.X, board.X + g.Input.BoardWidthMm);
            Assert.InRange(v.Centre.Y - v.CutOuterRadiusMm, 0, g.Input.BoardHeightMm);
            Assert.InRange(v.Centre.Y + v.CutOuterRadiusMm, 0, g.Input.BoardHeightMm);
        }
    }

    [SkippableFact]
    public void TopFaceMarksSitWhereTheElementsCrossTheFace()
    {
        // Independent of the template code: ring 1's top face is at height H/n; an element starting
        // at 360°·k/N crosses it after climbing (H/n − z_low) of its rise h, having turned that
        // fraction of its arc angle θ = sqrt(L² − h²)/R.
        var input = BuildInputs.Typical;
        var g = RenderedSets.Geometry(nameof(BuildInputs.Typical));
        var e = Read(RenderedSets.File(nameof(BuildInputs.Typical), "rings.dxf"));
        var v = RingTemplates.NestedTopFaces(g).Single(x => x.RingNumber == 1);
        var R = input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2;
        var theta = Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm) / R;
        var zLow = input.CentreHeightMm - input.ElementRiseMm / 2;
        var fraction = Math.Clamp((input.FormerHeightMm / input.RingCount - zLow) / input.ElementRiseMm, 0, 1);
        for (var k = 0; k < input.ElementCount; k++)
        {
            var az = 2 * Math.PI * k / input.ElementCount + theta * fraction;
            var x = v.Centre.X + input.FormerOuterDiameterMm / 2 * Math.Cos(az);
            var y = v.Centre.Y + input.FormerOuterDiameterMm / 2 * Math.Sin(az);
            Assert.Contains(e, l => l.Kind == "LINE" && l.Layer == "MARK" && Near(l.Numbers[0], x) && Near(l.Numbers[1], y));
        }
    }

    [SkippableTheory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void DrillDxfAuditsCleanWithHolesOfWirePlusClearance(string name)
    {
        var g = RenderedSets.Geometry(name);
        var e = Read(RenderedSets.File(name, "drill.dxf"));
        AssertCleanMillimetreDrawing(e);
        var holeRadius = (g.Input.WireDiameterMm + g.Input.DrillClearanceMm) / 2;
        var holes = e.Where(x => x.Kind == "CIRCLE" && x.Layer == "DRILL").ToList();
        var expected = Helipol.Emit.Dxf.DrillDxf.Placed(g).SelectMany(v => v.Holes.Select(h => v.Centre + h.Centre)).ToList();
        Assert.Equal(expected.Count, holes.Count);
        Assert.All(holes, h => Assert.True(Near(h.Numbers[2], holeRadius)));
        foreach (var p in expected)
            Assert.Contains(holes, h => Near(h.Numbers[0], p.X) && Near(h.Numbers[1], p.Y));
        Assert.Contains(e, x => x.Kind == "TEXT" && x.Text.Contains("MIRRORED"));
        Assert.Contains(e, x => x.Kind == "TEXT" && x.Text.Contains("DEG FROM THE AXIS"));
    }

    private static bool Near(double a, double b) => Math.Abs(a - b) <= 0.001;
}
