using Helipol.Design;

namespace Helipol.Tests.Design;

public class AxialRatioScoreTests
{
    // AR from the circular components: AR = (|E_R| + |E_L|)/||E_R| − |E_L|| (IEEE Std 145; Balanis,
    // Antenna Theory, §2.12). A 3 dB axial ratio goes with a cross-polar level about 15.3 dB below
    // the co-polar one (antenna handbooks' table of AR vs cross-polar discrimination, from memory).
    [Theory]
    [InlineData(3.0, 15.3)]
    [InlineData(1.0, 24.8)]
    [InlineData(6.0, 9.6)]
    public void AxialRatioAndCoCrossRatioMatchTheHandbookTable(double arDb, double coCrossDb)
    {
        Assert.Equal(coCrossDb, AxialRatioScore.CoCrossDbFromAxialRatioDb(arDb), 1);
        Assert.Equal(arDb, AxialRatioScore.AxialRatioDbFromCoCrossDb(coCrossDb), 1);
    }

    // The score must be continuous and strictly worse as the co/cross ratio falls, through linear
    // into the wrong sense, so a wrong-sense direction is worse than any right-sense one.
    [Fact]
    public void ScoreFallsSteadilyFromRightSenseThroughLinearToWrongSense()
    {
        double previous = double.NegativeInfinity;
        for (double xpd = 40; xpd >= -40; xpd -= 0.01)
        {
            double score = AxialRatioScore.Score(Math.Pow(10, xpd / 10), 1);
            Assert.True(score > previous, $"not increasing at {xpd} dB");
            Assert.True(score - previous < 1 || previous == double.NegativeInfinity || xpd > 30, $"jump at {xpd} dB");
            previous = score;
        }
        double worstRight = AxialRatioScore.Score(1.0001, 1);
        double bestWrong = AxialRatioScore.Score(1, 1.0001);
        Assert.True(bestWrong > worstRight);
    }
}
