namespace Helipol.Tests;

public class SmokeTests
{
    // Speed of light in vacuum, exact by definition of the metre (SI Brochure, 9th ed., 2019).
    [Fact]
    public void SpeedOfLightIsTheSiDefinedValue() => Assert.Equal(299_792_458.0, Helipol.Engine.PhysicalConstants.SpeedOfLight);
}
