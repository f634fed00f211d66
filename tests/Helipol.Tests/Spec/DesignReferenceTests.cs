using Helipol.Spec;

namespace Helipol.Tests.Spec;

public class DesignReferenceTests
{
    [Fact]
    public void ReadmeCarriesTheCurrentKeyReference()
    {
        var readme = File.ReadAllText(Path.Combine(TestPaths.RepositoryRoot, "README.md"));
        Assert.Contains(DesignReference.Markdown(), readme);
    }

    [Fact]
    public void EveryKeyIsDocumented() =>
        Assert.All(DesignKeys.Walk(DesignKeys.Root, ""), k => Assert.False(string.IsNullOrWhiteSpace(k.Field.Description), k.Path));
}
