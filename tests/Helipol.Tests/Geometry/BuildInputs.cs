using Helipol.Geometry;
using Helipol.Model;

namespace Helipol.Tests.Geometry;

/// <summary>
/// Build inputs for the geometry and emitter checks. The dimensions are a plausible 5.8 GHz
/// polarizer over a 10 mm whip cover (from memory); no check below depends on them being a good
/// design, only on them being buildable.
/// </summary>
public static class BuildInputs
{
    public static PolarizerBuildInput Typical => new()
    {
        DesignName = "test-5g8",
        Sense = Sense.Rhcp,
        Winding = Winding.Right,
        ElementCount = 4,
        ElementLengthMm = 14.2,
        ElementRiseMm = 6.8,
        CentreHeightMm = 11,
        WireDiameterMm = 0.8,
        FormerOuterDiameterMm = 16,
        FormerBoreDiameterMm = 10.4,
        FormerHeightMm = 22,
        CoverDiameterMm = 10,
        WrapMaterial = "PVC tape",
        WrapThicknessMm = 0.15,
        WrapLayers = 1,
        KerfMm = 0.2,
        RingCount = 2,
        BoardWidthMm = 120,
        BoardHeightMm = 80,
        BoardThicknessMm = 11,
        FrequencyHz = 5.8e9,
        SummaryLines = [new("Axial ratio at 5.8 GHz", "1.4 dB (demo value)")],
    };

    /// <summary>A left-hand, six-element, single-ring variant on US Letter at another dpi.</summary>
    public static PolarizerBuildInput LeftSixOnLetter => Typical with
    {
        DesignName = "test-left-6",
        Sense = Sense.Lhcp,
        Winding = Winding.Left,
        ElementCount = 6,
        ElementLengthMm = 11.5,
        ElementRiseMm = 7.5,
        CentreHeightMm = 9,
        FormerOuterDiameterMm = 20,
        FormerHeightMm = 18,
        RingCount = 1,
        Paper = Paper.Letter,
        Dpi = 200,
    };

    /// <summary>A large 915 MHz build: the former, wire and board of designs/telemetry-915.yaml with
    /// the element length and rise its solve gave (130.15 mm, 92.80 mm). Its wrap template is a
    /// 471 mm strip in three parts, more than one page holds.</summary>
    public static PolarizerBuildInput Large => Typical with
    {
        DesignName = "test-large-915",
        ElementCount = 6,
        ElementLengthMm = 130.15,
        ElementRiseMm = 92.80,
        CentreHeightMm = 50,
        WireDiameterMm = 1.0,
        FormerOuterDiameterMm = 150,
        FormerBoreDiameterMm = 12.5,
        FormerHeightMm = 100,
        CoverDiameterMm = 12,
        WrapMaterial = "packing tape",
        WrapLayers = 2,
        KerfMm = 0.5,
        RingCount = 1,
        BoardWidthMm = 600,
        BoardHeightMm = 600,
        BoardThicknessMm = 100,
        FrequencyHz = 915e6,
        Dpi = 150,
        SummaryLines = [],
    };

    public static IEnumerable<object[]> Both() => [[nameof(Typical)], [nameof(LeftSixOnLetter)]];

    public static PolarizerBuildInput ByName(string name) => name switch
    {
        nameof(Typical) => Typical,
        nameof(LeftSixOnLetter) => LeftSixOnLetter,
        nameof(Large) => Large,
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };
}
