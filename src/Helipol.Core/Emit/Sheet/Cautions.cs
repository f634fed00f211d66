namespace Helipol.Emit.Sheet;

/// <summary>Safety notes printed on every sheet (common practice, no source).</summary>
public static class Cautions
{
    public static readonly IReadOnlyList<string> Lines =
    [
        "Cut wire ends are sharp and fly off when snipped: wear eye protection, hold the offcut, file the ends smooth.",
        "Hot-melt glue and soldering irons burn skin and melt foam: work on a heat-proof mat and ventilate fumes.",
        "Hole saws and drills grab foam and plastic: clamp the part, never hold it by hand, keep fingers out of the line.",
        "Never transmit while fitting or adjusting a polarizer: a detuned antenna reflects power back into the transmitter.",
        "Keep people clear of a transmitting antenna and stay within your local RF exposure limits.",
        "Transmit only on the frequencies and at the power your local radio rules allow. These templates do not",
        "replace local regulations or licensed practice; where they differ, follow the regulations.",
    ];
}
