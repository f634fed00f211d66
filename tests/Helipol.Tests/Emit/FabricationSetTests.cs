using Helipol.Emit;
using Helipol.Tests.Geometry;

namespace Helipol.Tests.Emit;

public class FabricationSetTests
{
    [Fact]
    public void RenderingTwiceGivesIdenticalBytesForEveryFile()
    {
        var first = FabricationSet.Render(BuildInputs.LeftSixOnLetter);
        var second = FabricationSet.Render(BuildInputs.LeftSixOnLetter);
        Assert.Equal(FabricationSet.FileNames, first.Select(f => f.FileName));
        Assert.Equal(first.Select(f => f.FileName), second.Select(f => f.FileName));
        for (var i = 0; i < first.Count; i++)
            Assert.True(first[i].Bytes.AsSpan().SequenceEqual(second[i].Bytes), first[i].FileName + " differs between runs");
        // No clock in the PDFs (PDF 32000-1 §14.3.3 document information dictionary keys).
        foreach (var pdf in first.Where(f => f.FileName.EndsWith(".pdf")))
        {
            var text = System.Text.Encoding.Latin1.GetString(pdf.Bytes);
            Assert.DoesNotContain("/CreationDate", text);
            Assert.DoesNotContain("/ModDate", text);
        }
    }

    [Fact]
    public void WriterPutsEveryFileInTheFolderAndAFailureLeavesThemUntouched()
    {
        var folder = Path.Combine(Path.GetTempPath(), "helipol-fab-" + Guid.NewGuid().ToString("N"));
        try
        {
            var written = FabricationWriter.Write(BuildInputs.Typical, folder);
            Assert.Equal(FabricationSet.FileNames.Count, written.Count);
            var before = FabricationSet.FileNames.ToDictionary(n => n, n => File.ReadAllBytes(Path.Combine(folder, n)));
            var unbuildable = BuildInputs.Typical with { ElementRiseMm = 30 };
            Assert.Throws<ArgumentException>(() => FabricationWriter.Write(unbuildable, folder));
            foreach (var (n, bytes) in before)
                Assert.Equal(bytes, File.ReadAllBytes(Path.Combine(folder, n)));
            Assert.Equal(FabricationSet.FileNames.Order(), Directory.GetFiles(folder).Select(Path.GetFileName).Order());
        }
        finally
        {
            if (Directory.Exists(folder)) Directory.Delete(folder, true);
        }
    }
}
