using Helipol.Engine;
using Helipol.Model;

namespace Helipol.Design;

/// <summary>
/// The engine's measured sense (which also knows "linear") printed with the same capitals as the
/// design's wanted sense (<see cref="ChoiceWords.Label"/>), so a table can set the two side by side.
/// </summary>
public static class SenseLabels
{
    public static string Of(PolarizationSense sense) => sense switch
    {
        PolarizationSense.Rhcp => ChoiceWords.Label(Sense.Rhcp),
        PolarizationSense.Lhcp => ChoiceWords.Label(Sense.Lhcp),
        _ => "linear",
    };
}
