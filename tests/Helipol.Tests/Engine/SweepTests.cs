using Helipol.Engine;

namespace Helipol.Tests.Engine;

public class SweepTests
{
    // A sweep must give, in order, exactly what single solves give (each frequency has its own matrix,
    // so parallel order cannot change a bit), whatever the number of workers.
    [Fact]
    public void SweepEqualsSingleSolvesInOrder()
    {
        var mesh = MeshedModel.Create(InvariantTests.Awkward(), 1.3e9);
        var freqs = Enumerable.Range(0, 9).Select(i => 1.0e9 + 0.03e9 * i).ToArray();
        var one = MomSolver.Sweep(mesh, freqs, 1);
        var two = MomSolver.Sweep(mesh, freqs, 2);
        for (int i = 0; i < freqs.Length; i++)
        {
            var single = MomSolver.Solve(mesh, freqs[i]);
            Assert.Equal(freqs[i], two[i].FrequencyHz);
            Assert.Equal(single.InputImpedanceOhm(), one[i].InputImpedanceOhm());
            Assert.Equal(single.InputImpedanceOhm(), two[i].InputImpedanceOhm());
        }
        Assert.NotEqual(two[0].InputImpedanceOhm(), two[8].InputImpedanceOhm());
    }
}
