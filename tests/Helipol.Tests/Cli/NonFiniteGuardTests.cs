using System.Text;
using Helipol.Cli;

namespace Helipol.Tests.Cli;

/// <summary>The last check before build writes: NaN or infinity in design.json or report.md stops the build.</summary>
public class NonFiniteGuardTests
{
    private static (string, byte[]) F(string name, string text) => (name, Encoding.UTF8.GetBytes(text));

    [Theory]
    [InlineData("design.json", "{ \"ar_db\": NaN }", "NaN")]
    [InlineData("design.json", "{ \"gain\": -Infinity }", "Infinity")]
    [InlineData("report.md", "| worst AR | ∞ dB |", "∞")]
    public void NonFiniteNumbersInTextFilesAreFound(string name, string text, string token) =>
        Assert.Equal((name, token), NonFiniteGuard.Find([F("report.md", "all finite: 1.5 dB"), F(name, text)]));

    [Fact]
    public void WordsThatContainTheLettersAndBinaryFilesPass() =>
        Assert.Null(NonFiniteGuard.Find([F("report.md", "NaNo-coated wire; Infinityband"), F("ar-gain.png", "NaN")]));
}
