using Helipol.Model;

namespace Helipol.Tests.Model;

public class ElementClearanceTests
{
    [Theory]
    [InlineData(8, 0.040, 0.002, 0.014)]
    [InlineData(6, 0.030, 0.004, 0.010)]
    [InlineData(5, 0.060, 0.010, 0.008)]
    public void OverlappingElementsAreSeparatedLikeParallelHelices(int count, double length, double rise, double outerRadius)
    {
        // Neighbouring elements of one winding are parallel helices. Unrolled, they are parallel lines
        // of slope rise/run, offset along the circumference by 2πr/N; the perpendicular distance between
        // such lines is (2πr/N)·sin(pitch) = 2πr·rise/(N·L) (plane geometry). Valid when they overlap.
        var layout = new ElementLayout(count, length, rise, 2 * outerRadius, 0);
        Assert.True(layout.ArcAngleRad > 2 * Math.PI / count, "case must overlap");
        var expected = 2 * Math.PI * layout.AxisRadiusM * rise / (count * length);
        Assert.Equal(expected, ElementClearance.MinimumAxisDistanceM(layout), 9);
    }

    [Fact]
    public void ShortElementsAreFarApart()
    {
        // Practice geometry at 5.8 GHz: 5 elements of 16 mm over a 28 mm former leave wide gaps.
        var layout = new ElementLayout(5, 0.016, 0.0127, 0.028, 0.0008);
        Assert.True(ElementClearance.MinimumAxisDistanceM(layout) > 0.005);
    }
}
