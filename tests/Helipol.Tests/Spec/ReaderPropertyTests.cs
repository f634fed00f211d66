using System.Globalization;
using CsCheck;
using Helipol.Model;
using Helipol.Spec;

namespace Helipol.Tests.Spec;

/// <summary>
/// Property checks (CsCheck): whatever the text, the reader either accepts a design or refuses it
/// with a <see cref="DesignInputException"/> whose first line follows the error contract; it never
/// fails in any other way, and an accepted design always serializes without NaN or infinity.
/// </summary>
public class ReaderPropertyTests
{
    private static readonly string Ridge = File.ReadAllText(Path.Combine(TestPaths.Designs, "ridge-video-rx.yaml"));

    private static void AcceptOrRefuseCleanly(string text)
    {
        try
        {
            var design = DesignResolver.Resolve(SpecReader.ReadText(text, "p.yaml", TestPaths.Designs));
            var json = DesignJson.Write(design);
            Assert.DoesNotContain("NaN", json);
            Assert.DoesNotContain("Infinity", json);
        }
        catch (DesignInputException ex)
        {
            Assert.NotEmpty(ex.Errors);
            var line = ex.Errors[0].ToString();
            Assert.DoesNotContain('\n', line);
            Assert.Matches(@"^p\.yaml(:\d+:\d+)?: .+: found .+, allowed .+$", line);
        }
    }

    [Fact]
    public void RandomEditsOfADesignNeverCrashTheReader()
    {
        Gen.Select(Gen.Int[0, Ridge.Length], Gen.Int[0, 6], Gen.String[Gen.Char[" :{}[],-#&*!|>\n\"'0123456789.eE%aGHzm"], 0, 6])
            .Sample((at, cut, insert) =>
            {
                var end = Math.Min(Ridge.Length, at + cut);
                AcceptOrRefuseCleanly(Ridge[..at] + insert + Ridge[end..]);
            }, iter: 400);
    }

    [Fact]
    public void RandomNumbersInADesignNeverCrashTheResolver()
    {
        // Numbers across and beyond every limit, in every accepted unit.
        var number = Gen.Double[-1e4, 1e4].Select(v => v.ToString("R", CultureInfo.InvariantCulture));
        var unit = Gen.OneOf("mm", "cm", "m", "in", "");
        Gen.Select(number, unit, number, unit, number, unit)
            .Sample((l, lu, r, ru, d, du) =>
            {
                var text = Ridge.Replace("element_length: 0.63 in", $"element_length: {l} {lu}")
                    .Replace("element_rise: 0.5 in", $"element_rise: {r} {ru}")
                    .Replace("outer_diameter: 28 mm", $"outer_diameter: {d} {du}");
                AcceptOrRefuseCleanly(text);
            }, iter: 400);
    }
}
