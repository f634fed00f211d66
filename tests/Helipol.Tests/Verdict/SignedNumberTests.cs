using Helipol.Design;

namespace Helipol.Tests.Verdict;

/// <summary>
/// One signed-number form everywhere: the minus sign U+2212 (Unicode's MINUS SIGN, the sign typeset
/// mathematics uses; ISO 80000-1 writes it so), never the hyphen-minus, and no sign on a zero.
/// </summary>
public class SignedNumberTests
{
    [Theory]
    [InlineData(1.234, "0.0", "+1.2")]
    [InlineData(-1.234, "0.0", "\u22121.2")]
    [InlineData(-0.04, "0.0", "0.0")]
    [InlineData(0.04, "0.0", "0.0")]
    [InlineData(-392.25, "0.0", "\u2212392.3")]
    public void FormatsWithTheTrueMinus(double value, string format, string expected) =>
        Assert.Equal(expected, SignedNumber.Format(value, format));

    [Fact]
    public void PlainDropsOnlyThePlus()
    {
        Assert.Equal("1.50", SignedNumber.Plain(1.5, "0.00"));
        Assert.Equal("\u22121.50", SignedNumber.Plain(-1.5, "0.00"));
    }

    // The issue's "−+0.0" and hyphen-minus lines must not come back: no report or packet text carries
    // a hyphen-minus in front of a digit after a space, nor "+0.0"/"−0.0".
    [Fact]
    public void TheReportUsesOneMinus()
    {
        var report = File.ReadAllText(VerdictRuns.Get.Output(VerdictRuns.GoodDemo, "report.md"));
        foreach (var line in report.Split('\n').Where(l => l.StartsWith("- sensitivity") || l.StartsWith("- best-AR") || l.StartsWith("**Verdict")))
        {
            Assert.DoesNotMatch(@"(^|[\s(])-\d", line);
            Assert.DoesNotContain("+0.0 ", line);
            Assert.DoesNotContain("\u22120.0 ", line);
        }
    }
}
