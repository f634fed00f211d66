using Helipol.Model;

namespace Helipol.Design;

/// <summary>The element layout a design pins (for analyze, calibrate and the measured-build checks).</summary>
public static class PinnedLayout
{
    /// <summary>
    /// The pinned layout; throws <see cref="PinnedLayoutException"/> naming the first key left
    /// <c>auto</c>. Winding is checked by the caller when it matters.
    /// </summary>
    public static ElementLayout Require(PolarizerDesign design)
    {
        var p = design.Polarizer;
        DesignKey? auto = p.ElementLengthM is null ? Keys.PolarizerElementLength
            : p.ElementRiseM is null ? Keys.PolarizerElementRise
            : p.ElementCount is null ? Keys.PolarizerElements
            : p.Former.OuterDiameterM is null ? Keys.PolarizerFormerOuterDiameter : null;
        if (auto is not null) throw new PinnedLayoutException(auto.Path);
        return new ElementLayout(p.ElementCount!.Value, p.ElementLengthM!.Value, p.ElementRiseM!.Value, p.Former.OuterDiameterM!.Value, p.Wire.DiameterM);
    }
}

/// <summary>A verb that needs a pinned geometry met an <c>auto</c> key.</summary>
public sealed class PinnedLayoutException(string keyPath) : Exception($"{keyPath}: found auto, allowed a pinned value (this verb evaluates the geometry as written; run solve to choose it)")
{
    public string KeyPath { get; } = keyPath;
}
