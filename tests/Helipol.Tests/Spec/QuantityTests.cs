using Helipol.Spec;
using Helipol.Spec.Fields;

namespace Helipol.Tests.Spec;

/// <summary>
/// Quantities as users write them. The reference for conversions is the SI and its definitions:
/// 1 in = 25.4 mm exactly (NIST SP 811, appendix B), 1 GHz = 1e9 Hz, 1 deg = π/180 rad, 1 % = 0.01.
/// </summary>
public class QuantityTests
{
    private static SpecValue? Read(QuantityKind kind, string text)
    {
        var context = new ReadContext("t.yaml", ".");
        new QuantityField(kind, -1e12, 1e12, minInclusive: true).Read(new YamlScalar(new SourceMark(1, 1), text, true), "k", context);
        return context.Values.GetValueOrDefault("k");
    }

    [Theory]
    [InlineData("16 mm", 0.016)]
    [InlineData("1.6 cm", 0.016)]
    [InlineData("0.016 m", 0.016)]
    [InlineData("0.5 in", 0.0127)]        // NIST SP 811: 1 in = 0.0254 m exactly
    [InlineData("0.64in", 0.016256)]
    [InlineData("1.25 in", 0.03175)]
    public void LengthsConvertToMetres(string text, double metres)
    {
        var value = Assert.IsType<QuantityValue>(Read(QuantityKind.Length, text));
        Assert.Equal(metres, value.Si, 12);
    }

    [Theory]
    [InlineData("5.8 GHz", 5.8e9)]
    [InlineData("5.8GHz", 5.8e9)]
    [InlineData("915 MHz", 915e6)]
    [InlineData("433920 kHz", 433.92e6)]
    [InlineData("2450000000 Hz", 2.45e9)]
    public void FrequenciesConvertToHertz(string text, double hertz)
    {
        var value = Assert.IsType<QuantityValue>(Read(QuantityKind.Frequency, text));
        Assert.Equal(hertz, value.Si, 0);
    }

    [Theory]
    [InlineData("3 deg", Math.PI / 60)]
    [InlineData("180°", Math.PI)]
    [InlineData("1 rad", 1.0)]
    public void AnglesConvertToRadians(string text, double radians) =>
        Assert.Equal(radians, Assert.IsType<QuantityValue>(Read(QuantityKind.Angle, text)).Si, 12);

    // SI prefixes are case-sensitive (SI Brochure, 9th ed., §3: m = milli, M = mega), so "5800 mhz"
    // is refused, never guessed, but the refusal names the unit meant.
    [Theory]
    [InlineData("5800 mhz", "(did you mean 'MHz'?)")]
    [InlineData("5.8 ghz", "(did you mean 'GHz'?)")]
    [InlineData("433 KHZ", "(did you mean 'kHz'?)")]
    public void AUnitInTheWrongCaseIsRefusedWithTheRightOne(string text, string hint)
    {
        var context = new ReadContext("t.yaml", ".");
        new QuantityField(QuantityKind.Frequency, 1, 1e12).Read(new YamlScalar(new SourceMark(1, 1), text, true), "band.center", context);
        var error = Assert.Single(context.Errors.InFileOrder());
        Assert.EndsWith(hint, error.ToString());
        Assert.False(context.Values.ContainsKey("band.center"));
    }

    [Fact]
    public void AnUnknownUnitGetsNoCaseHint() =>
        Assert.Null(QuantityKind.Frequency.UnitWithOtherCase("mhzz"));

    [Fact]
    public void PercentIsAFraction() => Assert.Equal(0.3, Assert.IsType<QuantityValue>(Read(QuantityKind.Percent, "30 %")).Si, 12);

    [Fact]
    public void ConductivityIsSiemensPerMetre() => Assert.Equal(5.8e7, Assert.IsType<QuantityValue>(Read(QuantityKind.Conductivity, "5.8e7 S/m")).Si, 0);

    [Theory]
    [InlineData("16")]           // bare number
    [InlineData("NaN mm")]
    [InlineData(".inf")]
    [InlineData("-.inf mm")]
    [InlineData("16 ft")]        // a real unit, but not one we accept
    [InlineData("16 MM")]
    [InlineData("1,6 mm")]       // decimal comma
    [InlineData("sixteen mm")]
    public void MalformedLengthsAreRefused(string text) => Assert.Null(Read(QuantityKind.Length, text));

    [Fact]
    public void MillihertzIsNeverReadAsMegahertz() => Assert.Null(Read(QuantityKind.Frequency, "5800 mHz"));
}
