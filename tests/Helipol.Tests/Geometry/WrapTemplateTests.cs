using Helipol.Geometry;
using Helipol.Model;

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
            Assert.Equal(input.Winding == Winding.Right ? 1 : -1, Math.Sign(d.X));
            Assert.InRange(line.From.X, -1e-9, wrap.WidthMm + 1e-9);
            Assert.InRange(line.To.X, -1e-9, wrap.WidthMm + 1e-9);
        }
        // Pieces of one element add up to its full developed length sqrt(run² + h²).
        foreach (var grp in wrap.Lines.GroupBy(l => l.ElementNumber))
            Assert.Equal(Math.Sqrt(run * run + input.ElementRiseMm * input.ElementRiseMm), grp.Sum(l => (l.To - l.From).Length), 6);
        Assert.Equal(input.ElementCount, wrap.Lines.Select(l => l.ElementNumber).Distinct().Count());
    }

    public static IEnumerable<object[]> AllInputs() => [["Typical"], ["LeftSixOnLetter"], ["Large"], ["LeftLarge"]];

    [Theory]
    [MemberData(nameof(AllInputs))]
    public void NumbersStayClearOfEveryLine(string name)
    {
        // A number a line runs through cannot be read (common practice, no source). Each number's
        // box (WrapTemplate.LabelBoxMm) must lie inside the strip, keep the line's half stroke
        // (0.15 mm) plus a little clear of every line drawn, and sit within 5 mm of its element's
        // lower end so it is read as that line's number.
        var input = name == "LeftLarge"
            ? BuildInputs.Large with { Winding = Winding.Left, Sense = Sense.Lhcp }
            : BuildInputs.ByName(name);
        var wrap = WrapTemplate.From(new PolarizerGeometry(input));
        Assert.Equal(input.ElementCount, wrap.Labels.Count);
        foreach (var label in wrap.Labels)
        {
            var (w, h) = WrapTemplate.LabelBoxMm(label.ElementNumber.ToString().Length);
            var (x0, y0) = (label.BaselineLeft.X, label.BaselineLeft.Y);
            Assert.InRange(x0, 0, wrap.WidthMm - w);
            Assert.InRange(y0, 0, wrap.HeightMm - h);
            Assert.True((label.BaselineLeft - label.LowerEnd).Length < 5, $"number {label.ElementNumber} is far from its line");
            const double clear = 0.2;
            foreach (var line in wrap.Lines)
                for (var k = 0; k <= 2000; k++)
                {
                    var p = line.From + (k / 2000.0) * (line.To - line.From);
                    var inside = p.X > x0 - clear && p.X < x0 + w + clear && p.Y > y0 - clear && p.Y < y0 + h + clear;
                    Assert.False(inside, $"element {line.ElementNumber}'s line runs through number {label.ElementNumber}");
                }
        }
    }
}
