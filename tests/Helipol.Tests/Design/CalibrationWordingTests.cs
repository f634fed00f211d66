using Helipol.Design;

namespace Helipol.Tests.Design;

/// <summary>
/// The built-in calibration was measured on one material set (expanded-polystyrene foam under one
/// wrap of PVC tape, common practice, no source). A report for any other material set must say the
/// factor is borrowed, not describe it as that design's own.
/// </summary>
public class CalibrationWordingTests
{
    [Fact]
    public void TheMeasuredMaterialSetIsNotBorrowed()
    {
        var design = DesignFiles.Load("practice-foam-tape");
        Assert.False(CoatingCalibration.Default.IsBorrowedFor(design.Polarizer));
        Assert.Equal("calibration factor 13.3 for eps-foam + pvc-tape", CoatingCalibration.Default.DescribeFor(design.Polarizer));
    }

    [Fact]
    public void AnotherMaterialSetBorrowsTheFactorAndSaysSo()
    {
        var design = DesignFiles.Load("pec-air-search");
        Assert.True(CoatingCalibration.Default.IsBorrowedFor(design.Polarizer));
        var text = CoatingCalibration.Default.DescribeFor(design.Polarizer);
        Assert.Contains("measured on eps-foam + pvc-tape and borrowed for this design's air", text);
        Assert.DoesNotContain("13.3 for eps-foam", text);
    }
}
