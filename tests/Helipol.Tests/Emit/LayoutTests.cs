using System.Globalization;
using Helipol.Emit.Dxf;
using Helipol.Emit.Sheet;
using Helipol.Geometry;
using Helipol.Geometry.FromModel;
using Helipol.Model;
using Helipol.Tests.Geometry;
using UglyToad.PdfPig;
using Xunit.Abstractions;

namespace Helipol.Tests.Emit;

/// <summary>
/// The layout checks, read back by outside readers: in every PDF (PdfPig's word boxes) no two
/// words overlap, every word lies inside the printable area, and every page says "page n of m";
/// in every DXF (ezdxf's own text extents, which take a full text height per character) no two
/// texts overlap and every cut part lies on its board. Run over the test inputs, the demo designs
/// at their practice scaling, and random buildable inputs drawn from a seed printed with the
/// results (HELIPOL_LAYOUT_SEED repeats a run).
/// </summary>
public class LayoutTests(ITestOutputHelper output)
{
    /// <summary>Closest a word may come to the paper's edge: most office printers cannot print the
    /// outer 4 to 5 mm (common practice, no source).</summary>
    private const double PrintableMarginMm = 5;
    private const double PtPerMm = 72 / 25.4;
    private const int RandomInputs = 20;

    private static readonly string DesignsFolder = TestPaths.Designs;

    public static IEnumerable<object[]> Named() =>
        new[] { nameof(BuildInputs.Typical), nameof(BuildInputs.LeftSixOnLetter), nameof(BuildInputs.Large) }.Select(n => new object[] { n })
            .Concat(Directory.GetFiles(TestPaths.Designs, "*.yaml").OrderBy(f => f, StringComparer.Ordinal)
                .Select(f => new object[] { "design:" + Path.GetFileName(f) }));

    private static PolarizerBuildInput Input(string name)
    {
        if (!name.StartsWith("design:", StringComparison.Ordinal)) return BuildInputs.ByName(name);
        var file = Path.Combine(DesignsFolder, name["design:".Length..]);
        var design = DesignResolver.ReadFile(file, file);
        return BuildInputFromModel.Create(design, design.Practice, design.Polarizer.Winding == Winding.Auto ? PracticeScaling.WindingFor(design.Polarizer.Sense) : design.Polarizer.Winding);
    }

    [SkippableTheory]
    [MemberData(nameof(Named))]
    public void NamedInputsLayOutCleanly(string name) => AssertCleanLayout(Input(name), name);

    /// <summary>The run's seed, drawn once at discovery so it stands in the test's name (and so in
    /// every test listing, passed or failed); HELIPOL_LAYOUT_SEED overrides it.</summary>
    public static IEnumerable<object[]> Seed() =>
    [[Environment.GetEnvironmentVariable("HELIPOL_LAYOUT_SEED") is { Length: > 0 } s
        ? int.Parse(s, CultureInfo.InvariantCulture)
        : Random.Shared.Next()]];

    [SkippableTheory]
    [MemberData(nameof(Seed))]
    public void RandomBuildableInputsLayOutCleanly(int seed)
    {
        output.WriteLine($"layout seed {seed} (set HELIPOL_LAYOUT_SEED={seed} to repeat)");
        var rng = new Random(seed);
        for (var k = 0; k < RandomInputs; k++)
        {
            var input = RandomInput(rng, k);
            AssertCleanLayout(input, $"seed {seed}, input {k} ({input.DesignName}: {input.ElementCount} × {input.ElementLengthMm:0.0} mm on {input.FormerOuterDiameterMm:0.0} mm, {input.RingCount} rings, {input.Paper})");
        }
    }

    /// <summary>A buildable input from 0.4 to 6 GHz: the former, element and wire scale with the
    /// wavelength about the 5.8 GHz test input, each drawn within a factor of its scaled value, and
    /// the board is drawn large enough to hold one ring.</summary>
    private static PolarizerBuildInput RandomInput(Random rng, int k)
    {
        double U(double a, double b) => a + (b - a) * rng.NextDouble();
        var f = Math.Exp(U(Math.Log(0.4e9), Math.Log(6e9)));
        var scale = 5.8e9 / f;
        var od = U(14, 24) * scale;
        var bore = Math.Max(3, U(0.3, 0.7) * od);
        var length = U(11, 16) * scale;
        var rise = U(0.3, 0.7) * length;
        var height = rise * U(1.05, 1.6);
        var rings = rng.Next(1, 7);
        var cell = 2 * (od / 2 + 0.5 + 5) + 12;
        var paper = rng.Next(2) == 0 ? Paper.A4 : Paper.Letter;
        return BuildInputs.Typical with
        {
            DesignName = $"random-{k}-{(f / 1e6).ToString("0", CultureInfo.InvariantCulture)}mhz",
            Sense = rng.Next(2) == 0 ? Sense.Rhcp : Sense.Lhcp,
            Winding = rng.Next(2) == 0 ? Winding.Right : Winding.Left,
            ElementCount = rng.Next(3, 9),
            ElementLengthMm = length,
            ElementRiseMm = rise,
            CentreHeightMm = height / 2,
            WireDiameterMm = Math.Clamp(0.8 * Math.Sqrt(scale), 0.5, 2),
            FormerOuterDiameterMm = od,
            FormerBoreDiameterMm = bore,
            FormerHeightMm = height,
            CoverDiameterMm = bore - 0.4,
            KerfMm = U(0, 0.5),
            RingCount = rings,
            BoardWidthMm = Math.Max(cell + 20, U(100, 600)),
            BoardHeightMm = Math.Max(cell + 20, U(100, 600)),
            Paper = paper,
            FrequencyHz = f,
            SummaryLines = [],
        };
    }

    private void AssertCleanLayout(PolarizerBuildInput input, string what)
    {
        var g = new PolarizerGeometry(input);
        AssertPdf(PacketPdf.Write(g), input.Paper, what + ", packet.pdf");
        AssertPdf(BendSheetPdf.Write(g), input.Paper, what + ", bend-sheet.pdf");
        AssertDxf(RingsDxf.Write(g), what + ", rings.dxf", board: true);
        AssertDxf(DrillDxf.Write(g), what + ", drill.dxf", board: false);
    }

    private static void AssertPdf(byte[] bytes, Paper paper, string what)
    {
        using var pdf = PdfDocument.Open(bytes);
        var (wMm, hMm) = paper == Paper.A4 ? (210.0, 297.0) : (215.9, 279.4);
        var margin = PrintableMarginMm * PtPerMm;
        foreach (var page in pdf.GetPages())
        {
            var words = page.GetWords().Where(w => !string.IsNullOrWhiteSpace(w.Text)).ToList();
            var text = string.Join(" ", words.Select(w => w.Text));
            Assert.True(text.Contains($"page {page.Number} of {pdf.NumberOfPages}", StringComparison.Ordinal), $"{what}: page {page.Number} does not say 'page {page.Number} of {pdf.NumberOfPages}'");
            foreach (var w in words)
            {
                var b = w.BoundingBox;
                Assert.True(b.Left >= margin && b.Right <= wMm * PtPerMm - margin && b.Bottom >= margin && b.Top <= hMm * PtPerMm - margin,
                    $"{what}: page {page.Number}: '{w.Text}' at ({b.Left / PtPerMm:0.0}, {b.Bottom / PtPerMm:0.0}) mm lies outside the printable area");
            }
            // PdfPig's word boxes run from baseline-ish to cap height; a 0.2 pt overlap is allowed for
            // touching boxes of neighbouring lines.
            for (var i = 0; i < words.Count; i++)
                for (var j = i + 1; j < words.Count; j++)
                {
                    var a = words[i].BoundingBox;
                    var c = words[j].BoundingBox;
                    var overlapX = Math.Min(a.Right, c.Right) - Math.Max(a.Left, c.Left);
                    var overlapY = Math.Min(a.Top, c.Top) - Math.Max(a.Bottom, c.Bottom);
                    Assert.False(overlapX > 0.2 && overlapY > 0.2,
                        $"{what}: page {page.Number}: '{words[i].Text}' and '{words[j].Text}' overlap at ({a.Left / PtPerMm:0.0}, {a.Bottom / PtPerMm:0.0}) mm");
                }
        }
    }

    // Every drawn path (PdfPig's page paths: the content stream's path operators, in page space
    // after the transformation matrix, cut to the clipping paths in force, as a viewer shows them:
    // a tiled face is drawn whole and clipped to its tile) and every placed image of the packet must
    // lie inside the printable area like the words do; half the line width is added, since a stroke
    // spreads that far past its path. Clipping paths draw nothing and are left out.
    [SkippableTheory]
    [MemberData(nameof(Named))]
    public void PacketDrawingsStayInsideThePrintableArea(string name)
    {
        var input = Input(name);
        using var pdf = PdfDocument.Open(PacketPdf.Write(new PolarizerGeometry(input)), new ParsingOptions { ClipPaths = true });
        var (wMm, hMm) = input.Paper == Paper.A4 ? (210.0, 297.0) : (215.9, 279.4);
        var margin = PrintableMarginMm * PtPerMm;
        int paths = 0;
        foreach (var page in pdf.GetPages())
        {
            Assert.Equal(wMm * PtPerMm, page.Width, 0);
            Assert.Equal(hMm * PtPerMm, page.Height, 0);
            foreach (var path in page.Paths.Where(p => !p.IsClipping && (p.IsStroked || p.IsFilled)))
            {
                if (path.GetBoundingRectangle() is not { } b) continue;
                paths++;
                double half = path.IsStroked ? (double)path.LineWidth / 2 : 0;
                Assert.True(b.Left - half >= margin && b.Right + half <= page.Width - margin && b.Bottom - half >= margin && b.Top + half <= page.Height - margin,
                    $"{name}: packet page {page.Number}: a drawn path spanning ({b.Left / PtPerMm:0.0}, {b.Bottom / PtPerMm:0.0})-({b.Right / PtPerMm:0.0}, {b.Top / PtPerMm:0.0}) mm runs outside the printable area");
            }
            foreach (var image in page.GetImages())
            {
                var b = image.BoundingBox;
                Assert.True(b.Left >= margin && b.Right <= page.Width - margin && b.Bottom >= margin && b.Top <= page.Height - margin,
                    $"{name}: packet page {page.Number}: an image at ({b.Left / PtPerMm:0.0}, {b.Bottom / PtPerMm:0.0})-({b.Right / PtPerMm:0.0}, {b.Top / PtPerMm:0.0}) mm runs outside the printable area");
            }
        }
        output.WriteLine($"{name}: {pdf.NumberOfPages} pages, {paths} drawn paths, all inside the printable area");
        Assert.True(paths > 0, $"{name}: PdfPig found no drawn paths in the packet");
    }

    // ezdxf's bounding box of each TEXT (fast mode: width = characters × height, descender below the
    // baseline), and each CUT entity's and BOARD rectangle's box.
    private const string Boxes = """
import sys, ezdxf, ezdxf.bbox
doc = ezdxf.readfile(sys.argv[1])
for e in doc.modelspace():
    t = e.dxftype()
    if t in ("TEXT", "POLYLINE", "CIRCLE"):
        b = ezdxf.bbox.extents([e], fast=True)
        if b.has_data:
            label = e.dxf.text if t == "TEXT" else ""
            print(t, e.dxf.layer, repr(b.extmin.x), repr(b.extmin.y), repr(b.extmax.x), repr(b.extmax.y), label)
""";

    private static void AssertDxf(byte[] dxf, string what, bool board)
    {
        OutsideReaders.RequireEzdxf();
        var dir = OutsideReaders.TempFolder();
        var path = Path.Combine(dir, "drawing.dxf");
        var script = Path.Combine(dir, "boxes.py");
        File.WriteAllBytes(path, dxf);
        File.WriteAllText(script, Boxes);
        var (code, stdout) = OutsideReaders.Run(OutsideReaders.SystemPython, [script, path], out var err);
        Directory.Delete(dir, true);
        Assert.True(code == 0, "ezdxf could not read the file: " + err);
        var boxes = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(line =>
        {
            var p = line.Split(' ', 7);
            var n = p[2..6].Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
            return (Kind: p[0], Layer: p[1], X0: n[0], Y0: n[1], X1: n[2], Y1: n[3], Text: p.Length > 6 ? p[6] : "");
        }).ToList();
        var texts = boxes.Where(b => b.Kind == "TEXT").ToList();
        Assert.NotEmpty(texts);
        for (var i = 0; i < texts.Count; i++)
            for (var j = i + 1; j < texts.Count; j++)
            {
                var (a, c) = (texts[i], texts[j]);
                var ox = Math.Min(a.X1, c.X1) - Math.Max(a.X0, c.X0);
                var oy = Math.Min(a.Y1, c.Y1) - Math.Max(a.Y0, c.Y0);
                Assert.False(ox > 0.01 && oy > 0.01, $"{what}: '{a.Text}' and '{c.Text}' overlap at ({a.X0:0.0}, {a.Y0:0.0}) mm");
            }
        if (!board) return;
        var boards = boxes.Where(b => b.Layer == "BOARD").ToList();
        foreach (var cut in boxes.Where(b => b.Layer == "CUT"))
            Assert.True(boards.Any(b => cut.X0 >= b.X0 - 1e-6 && cut.X1 <= b.X1 + 1e-6 && cut.Y0 >= b.Y0 - 1e-6 && cut.Y1 <= b.Y1 + 1e-6),
                $"{what}: a cut part at ({cut.X0:0.0}, {cut.Y0:0.0}) mm lies off every board");
    }
}
