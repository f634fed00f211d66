using Helipol.Geometry;

namespace Helipol.Tests.Geometry;

public class WrapTemplateTests
{
    [Theory]
    [MemberData(nameof(BuildInputs.Both), MemberType = typeof(BuildInputs))]
    public void LinesStandAtRiseOverHorizontalArcLengthOnTheFormerSurface(string name)
    {
        var input = BuildInputs.ByName(name);
        var wrap = WrapTemplate.From(new PolarizerGeometry(input));
        // Independent of the geometry code: the strip is the former's surface (radius D/2)
        // developed flat; an element turning through θ = sqrt(L² − h²)/R (R = D/2 + d/2) covers a
        // horizontal arc θ·D/2 there, so its line stands at atan(h / (θ·D/2)) from horizontal.
        var R = input.FormerOuterDiameterMm / 2 + input.WireDiameterMm / 2;
        var theta = Math.Sqrt(input.ElementLengthMm * input.ElementLengthMm - input.ElementRiseMm * input.ElementRiseMm) / R;
        var run = theta * input.FormerOuterDiameterMm / 2;
        var expectedDeg = Math.Atan(input.ElementRiseMm / run) * 180 / Math.PI;
        Assert.Equal(Math.PI * input.FormerOuterDiameterMm, wrap.WidthMm, 9);
        foreach (var line in wrap.Lines)
        {
            var d = line.To - line.From;
            var angleDeg = Math.Atan(Math.Abs(d.Y) / Math.Abs(d.X)) * 180 / Math.PI;
            Assert.InRange(angleDeg, expectedDeg - 0.05, expectedDeg + 0.05);
            Assert.Equal(input.Winding == HelixWinding.Right ? 1 : -1, Math.Sign(d.X));
            Assert.InRange(line.From.X, -1e-9, wrap.WidthMm + 1e-9);
            Assert.InRange(line.To.X, -1e-9, wrap.WidthMm + 1e-9);
        }
        // Pieces of one element add up to its full developed length sqrt(run² + h²).
        foreach (var grp in wrap.Lines.GroupBy(l => l.ElementNumber))
            Assert.Equal(Math.Sqrt(run * run + input.ElementRiseMm * input.ElementRiseMm), grp.Sum(l => (l.To - l.From).Length), 6);
        Assert.Equal(input.ElementCount, wrap.Lines.Select(l => l.ElementNumber).Distinct().Count());
    }
}
