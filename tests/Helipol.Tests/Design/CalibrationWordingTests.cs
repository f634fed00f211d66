using Helipol.Design;

namespace Helipol.Tests.Design;

/// <summary>
/// A calibration fitted on one material set (here expanded-polystyrene foam under one wrap of PVC
/// tape) and used for a design of other materials must say the factor is borrowed; the built-in
/// default (factor 1, the field solve) belongs to every material set.
/// </summary>
public class CalibrationWordingTests
{
    private static readonly CoatingCalibration FoamTape = new("eps-foam + pvc-tape", 1.4, "a measured build", null, "calibration file cal.yaml");

    [Fact]
    public void TheDefaultIsPhysicsForEveryMaterialSet()
    {
        var design = DesignFiles.Load("pec-air-search");
        Assert.False(CoatingCalibration.Default.IsBorrowedFor(design.Polarizer));
        Assert.Equal("calibration factor 1 for any material set", CoatingCalibration.Default.DescribeFor(design.Polarizer));
    }

    [Fact]
    public void TheMeasuredMaterialSetIsNotBorrowed()
    {
        var design = DesignFiles.Load("practice-foam-tape");
        Assert.False(FoamTape.IsBorrowedFor(design.Polarizer));
        Assert.Equal("calibration factor 1.4 for eps-foam + pvc-tape", FoamTape.DescribeFor(design.Polarizer));
    }

    [Fact]
    public void AnotherMaterialSetBorrowsTheFactorAndSaysSo()
    {
        var design = DesignFiles.Load("pec-air-search");
        Assert.True(FoamTape.IsBorrowedFor(design.Polarizer));
        var text = FoamTape.DescribeFor(design.Polarizer);
        Assert.Contains("measured on eps-foam + pvc-tape and borrowed for this design's air", text);
    }
}
