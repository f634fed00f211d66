using Helipol.Model;

namespace Helipol.Tests.Model;

public class PracticeScalingTests
{
    [Fact]
    public void AtTheReferenceFrequencyTheRuleOfThumbComesBack()
    {
        // Common practice, no source: at 5.8 GHz about 16 mm elements rising 0.5 in (12.7 mm).
        Assert.Equal(0.016, PracticeScaling.ElementLengthM(5.8e9), 12);
        Assert.Equal(0.0127, PracticeScaling.ElementRiseM(5.8e9), 12);
        // The quoted 0.62-0.66 in range contains 16 mm (NIST SP 811: 1 in = 25.4 mm).
        Assert.InRange(PracticeScaling.ElementLengthM(5.8e9), 0.62 * 0.0254, 0.66 * 0.0254);
    }

    [Theory]
    [InlineData(2.9e9, 2.0)]
    [InlineData(1.16e9, 5.0)]
    public void LengthsScaleWithWavelength(double frequencyHz, double factor)
    {
        // Electrical size is length/λ; keeping it fixed means length ∝ 1/f (Maxwell's equations scale).
        Assert.Equal(0.016 * factor, PracticeScaling.ElementLengthM(frequencyHz), 12);
        Assert.Equal(0.0127 * factor, PracticeScaling.ElementRiseM(frequencyHz), 12);
    }

    [Fact]
    public void RhcpIsElementsDescendingToTheRight()
    {
        // Common practice, no source: elements that descend to the right seen from outside give RHCP.
        // Seen from outside, azimuth increases to the viewer's right, so descending to the right is
        // the winding whose azimuth decreases as it rises: our "left".
        Assert.Equal(Winding.Left, PracticeScaling.WindingFor(Sense.Rhcp));
        Assert.Equal(Winding.Right, PracticeScaling.WindingFor(Sense.Lhcp));
    }
}
