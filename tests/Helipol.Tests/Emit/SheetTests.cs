using System.Buffers.Binary;
using System.Globalization;
using SkiaSharp;
using UglyToad.PdfPig;
using Helipol.Geometry;
using Helipol.Tests.Geometry;
using Helipol.Model;

namespace Helipol.Tests.Emit;

public class SheetTests
{
    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void PngCarriesItsDpiInPhys(string name)
    {
        var input = BuildInputs.ByName(name);
        var png = RenderedSets.File(name, "bend-sheet.png");
        // PNG Specification (2nd ed.) §5.2 signature, §11.2.2 IHDR, §11.3.5.3 pHYs: pixels per
        // unit on x and y, unit specifier 1 = metre; §5.3 every chunk ends in a CRC-32 of its
        // type and data (checked here with a bit-by-bit CRC, not the writer's table).
        Assert.Equal(new byte[] { 137, 80, 78, 71, 13, 10, 26, 10 }, png[..8]);
        var chunks = Chunks(png);
        Assert.Equal("IHDR", chunks[0].Type);
        var (paperW, paperH) = input.Paper == Paper.A4 ? (210.0, 297.0) : (215.9, 279.4);
        Assert.Equal((int)Math.Round(paperW / 25.4 * input.Dpi), (int)BinaryPrimitives.ReadUInt32BigEndian(chunks[0].Data));
        Assert.Equal((int)Math.Round(paperH / 25.4 * input.Dpi), (int)BinaryPrimitives.ReadUInt32BigEndian(chunks[0].Data.AsSpan(4)));
        var phys = chunks.Single(c => c.Type == "pHYs");
        var ppm = Math.Round(input.Dpi / 0.0254);
        Assert.Equal(ppm, BinaryPrimitives.ReadUInt32BigEndian(phys.Data));
        Assert.Equal(ppm, BinaryPrimitives.ReadUInt32BigEndian(phys.Data.AsSpan(4)));
        Assert.Equal(1, phys.Data[8]);
        Assert.True(chunks.IndexOf(phys) < chunks.FindIndex(c => c.Type == "IDAT"), "pHYs must precede the first IDAT");
        Assert.All(chunks, c => Assert.True(c.CrcOk, $"bad CRC on {c.Type}"));
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void CalibrationBarsMeasureFiftyMillimetresAndTwoInchesInPixels(string name)
    {
        var input = BuildInputs.ByName(name);
        using var decoded = SKBitmap.Decode(RenderedSets.File(name, "bend-sheet.png"));
        using var bitmap = decoded.Copy(SKColorType.Rgba8888);
        var pixels = bitmap.GetPixelSpan().ToArray();
        double Luma(int x, int y)
        {
            var i = 4 * (y * bitmap.Width + x);
            return 0.299 * pixels[i] + 0.587 * pixels[i + 1] + 0.114 * pixels[i + 2];
        }
        var pxPerMm = input.Dpi / 25.4;
        // Find solid dark rectangles: a horizontal run of dark pixels repeated unchanged over at
        // least 2 mm of rows. The first two found from the top are the bars.
        var runsByRow = new List<List<(int Start, int End)>>();
        for (var y = 0; y < bitmap.Height; y++)
        {
            var runs = new List<(int, int)>();
            var start = -1;
            for (var x = 0; x <= bitmap.Width; x++)
            {
                var dark = x < bitmap.Width && Luma(x, y) < 128;
                if (dark && start < 0) start = x;
                if (!dark && start >= 0) { if (x - start > 20) runs.Add((start, x)); start = -1; }
            }
            runsByRow.Add(runs);
        }
        var bars = new List<(int Top, int Start, int Length)>();
        var minRows = (int)(2 * pxPerMm);
        for (var y = 0; y < bitmap.Height && bars.Count < 2; y++)
            foreach (var run in runsByRow[y])
            {
                if (y > 0 && runsByRow[y - 1].Contains(run)) continue;
                var rows = 1;
                while (y + rows < bitmap.Height && runsByRow[y + rows].Contains(run)) rows++;
                if (rows >= minRows) bars.Add((y, run.Start, run.End - run.Start));
            }
        Assert.Equal(2, bars.Count);
        var ordered = bars.OrderBy(b => b.Start).ToList();
        Assert.InRange(ordered[0].Length, 50 * pxPerMm - 1, 50 * pxPerMm + 1);
        Assert.InRange(ordered[1].Length, 50.8 * pxPerMm - 1, 50.8 * pxPerMm + 1);
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void BendSheetPdfIsTrueSizeAndCarriesTheBuildTable(string name)
    {
        var input = BuildInputs.ByName(name);
        using var pdf = PdfDocument.Open(RenderedSets.File(name, "bend-sheet.pdf"));
        Assert.Equal(1, pdf.NumberOfPages);
        var page = pdf.GetPage(1);
        AssertPaper(input.Paper, page.Width, page.Height);
        var text = string.Join(" ", page.GetWords().Select(w => w.Text));
        foreach (var label in new[] { "Element length", "Rise", "Pitch angle", "Arc angle", "Count", "Spacing", "Wrap" })
            Assert.Contains(label, text);
        // Values worked out here from the input: length, and pitch atan(h / sqrt(L² − h²)).
        var ci = CultureInfo.InvariantCulture;
        Assert.Contains(input.ElementLengthMm.ToString("0.00", ci) + " mm", text);
        var pitch = Math.Atan(input.ElementRiseMm / Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm)) * 180 / Math.PI;
        Assert.Contains(pitch.ToString("0.00", ci) + "°", text);
        Assert.Contains("regulations", text);
        Assert.Contains("RF exposure", text);
    }

    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void PacketHasSummaryBendSheetAndRingTemplates(string name)
    {
        var input = BuildInputs.ByName(name);
        using var pdf = PdfDocument.Open(RenderedSets.File(name, "packet.pdf"));
        Assert.True(pdf.NumberOfPages >= 3);
        var texts = pdf.GetPages().Select(p =>
        {
            AssertPaper(input.Paper, p.Width, p.Height);
            return string.Join(" ", p.GetWords().Select(w => w.Text));
        }).ToList();
        Assert.Contains("Axial ratio at 5.8 GHz", texts[0]);
        Assert.Contains(texts, t => t.Contains("Bend sheet") && t.Contains("Pitch angle"));
        for (var ring = 1; ring <= input.RingCount; ring++)
            Assert.Contains(texts, t => t.Contains("Ring templates") && t.Contains($"Ring {ring}, top face") && t.Contains($"Ring {ring}, bottom face"));
    }

    [Theory]
    [InlineData("bend-sheet.pdf")]
    [InlineData("packet.pdf")]
    public void LargeDesignKeepsEverySectionOnThePaper(string file)
    {
        // A 150 mm former unrolls to a 471 mm strip (π × 150), three parts on A4's 186 mm of width
        // between margins; those parts alone are taller than one page, so the sheet must flow on.
        // PdfPig reads the text back: every section title and every part is there, and no letter
        // lies outside the paper (PDF 32000-1 §8.3.2.3: the page is 595.28 × 841.89 pt).
        using var pdf = PdfDocument.Open(RenderedSets.File(nameof(BuildInputs.Large), file));
        var text = string.Join(" ", pdf.GetPages().Select(p => string.Join(" ", p.GetWords().Select(w => w.Text))));
        foreach (var title in new[] { "1 Element:", "2 Wrap template:", "3 Bend:", "4 Which way the elements run", "5 Build table", "6 Cautions",
                     "part 1 of 3", "part 2 of 3", "part 3 of 3", "one turn of the former", "Pitch angle", "RF exposure" })
            Assert.Contains(title, text);
        foreach (var page in pdf.GetPages())
        {
            AssertPaper(Paper.A4, page.Width, page.Height);
            Assert.All(page.Letters, l => Assert.True(l.BoundingBox.Bottom >= 0 && l.BoundingBox.Top <= page.Height,
                $"'{l.Value}' at y = {l.BoundingBox.Bottom:0.0} pt lies off page {page.Number}"));
        }
        if (file == "bend-sheet.pdf")
        {
            Assert.True(pdf.NumberOfPages > 1);
            // The PNG holds the same pages one under the other, each one paper tall (A4 at 150 dpi).
            var png = RenderedSets.File(nameof(BuildInputs.Large), "bend-sheet.png");
            Assert.Equal((int)Math.Round(297 / 25.4 * 150) * pdf.NumberOfPages, (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(20)));
        }
    }

    [Fact]
    public void PacketCarriesThePlotsItIsGiven()
    {
        // Two plots handed in as PNG bytes must come out as two image XObjects (PdfPig reads
        // them back from the page resources, PDF 32000-1 §8.9).
        byte[] Plot(SKColor colour)
        {
            using var bmp = new SKBitmap(300, 200);
            bmp.Erase(colour);
            using var img = SKImage.FromBitmap(bmp);
            return img.Encode(SKEncodedImageFormat.Png, 100).ToArray();
        }
        var input = BuildInputs.Typical with { PlotPngs = [Plot(SKColors.SteelBlue), Plot(SKColors.Orange)] };
        var bytes = Helipol.Emit.FabricationSet.Render(input).Single(f => f.FileName == "packet.pdf").Bytes;
        using var pdf = PdfDocument.Open(bytes);
        Assert.Equal(2, pdf.GetPages().Sum(p => p.GetImages().Count()));
    }

    [Fact]
    public void PacketEmbedsPlotsWithoutLoss()
    {
        // A plot's one-pixel lines and small lettering must come through unchanged. PdfPig decodes
        // the image back from the file (Flate, PDF 32000-1 §7.4.4); a JPEG (DCTDecode, §7.4.8) is
        // lossy and would not give the same pixels, nor would PdfPig hand it back as PNG.
        using var bmp = new SKBitmap(new SKImageInfo(240, 160, SKColorType.Rgba8888, SKAlphaType.Opaque));
        for (var y = 0; y < bmp.Height; y++)
            for (var x = 0; x < bmp.Width; x++)
                bmp.SetPixel(x, y, (x + y) % 2 == 0 ? SKColors.White : new SKColor((byte)x, (byte)y, (byte)(x ^ y)));
        using var img = SKImage.FromBitmap(bmp);
        var png = img.Encode(SKEncodedImageFormat.Png, 100).ToArray();
        var input = BuildInputs.Typical with { PlotPngs = [png] };
        var bytes = Helipol.Emit.FabricationSet.Render(input).Single(f => f.FileName == "packet.pdf").Bytes;
        using var pdf = PdfDocument.Open(bytes);
        var image = pdf.GetPages().SelectMany(p => p.GetImages()).Single();
        Assert.True(image.TryGetPng(out var decodedPng), "the embedded plot is not stored losslessly");
        using var decoded = SKBitmap.Decode(decodedPng).Copy(SKColorType.Rgba8888);
        Assert.Equal((bmp.Width, bmp.Height), (decoded.Width, decoded.Height));
        for (var y = 0; y < bmp.Height; y++)
            for (var x = 0; x < bmp.Width; x++)
                Assert.Equal(bmp.GetPixel(x, y), decoded.GetPixel(x, y));
    }

    /// <summary>PDF 32000-1:2008 §8.3.2.3: user space units are 1/72 in; A4 (ISO 216) is
    /// 210 × 297 mm = 595.28 × 841.89 pt, US Letter 8.5 × 11 in = 612 × 792 pt.</summary>
    private static void AssertPaper(Paper paper, double w, double h)
    {
        var (ew, eh) = paper == Paper.A4 ? (595.28, 841.89) : (612.0, 792.0);
        Assert.InRange(w, ew - 0.01, ew + 0.01);
        Assert.InRange(h, eh - 0.01, eh + 0.01);
    }

    private sealed record Chunk(string Type, byte[] Data, bool CrcOk);

    private static List<Chunk> Chunks(byte[] png)
    {
        var list = new List<Chunk>();
        var at = 8;
        while (at < png.Length)
        {
            var len = (int)BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at));
            var type = System.Text.Encoding.ASCII.GetString(png, at + 4, 4);
            var data = png.AsSpan(at + 8, len).ToArray();
            var crc = BinaryPrimitives.ReadUInt32BigEndian(png.AsSpan(at + 8 + len));
            list.Add(new Chunk(type, data, crc == BitwiseCrc32(png.AsSpan(at + 4, 4 + len))));
            at += 12 + len;
        }
        return list;
    }

    private static uint BitwiseCrc32(ReadOnlySpan<byte> bytes)
    {
        var crc = 0xFFFFFFFFu;
        foreach (var b in bytes)
        {
            crc ^= b;
            for (var k = 0; k < 8; k++) crc = (crc >> 1) ^ (0xEDB88320u & (uint)-(int)(crc & 1));
        }
        return ~crc;
    }
}
