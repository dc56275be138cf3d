using System.IO;
using System.Linq;
using Phaseward.Benchmarks;
using Phaseward.Checking;
using Phaseward.Netlists;

namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// The compile-time elaborator and Design.Elaborate() must build the same netlist -- devices, connections, names,
/// figures and the file and line of every call -- for the test designs and for every sample.
/// </summary>
public class ParityTests
{
    private static readonly InMemoryDesigns TestDesigns = InMemoryDesigns.FromFiles(
        Directory.GetFiles(Repository.PathOf("tests", "Phaseward.Analyzers.Tests", "Elaboration", "Designs"), "*.cs").OrderBy(p => p).ToArray());

    [Theory]
    [InlineData("ParityDesigns.StraightLine")]
    [InlineData("ParityDesigns.Loops")]
    [InlineData("ParityDesigns.NestedLoops")]
    [InlineData("ParityDesigns.Switches")]
    [InlineData("ParityDesigns.ProcessAndClocks")]
    [InlineData("ParityDesigns.FieldsAndProperties")]
    [InlineData("ParityDesigns.Helpers")]
    [InlineData("ParityDesigns.LocalFunctions")]
    [InlineData("ParityDesigns.Recursion")]
    [InlineData("ParityDesigns.Collections")]
    [InlineData("ParityDesigns.Tuples")]
    [InlineData("ParityDesigns.RefAndOut")]
    [InlineData("ParityDesigns.ExclusiveSelects")]
    public void TestDesignMatchesRunTime(string design) => AssertParity(TestDesigns, design);

    [Fact]
    public void ConstructorArgumentsComeFromTheInstantiationInTheCompilation()
    {
        // Catalog.All() creates 'new Constructed(5)' (which chains to the two-parameter constructor) and 'new Primary(3)'.
        AssertParity(TestDesigns, "ParityDesigns.Constructed", 5, 3.Nanoseconds());
        AssertParity(TestDesigns, "ParityDesigns.Primary", 3);
        Assert.Equal("constructed-5", TestDesigns.CompileTime("ParityDesigns.Constructed").DesignName);
    }

    [Fact]
    public void EveryTestDesignIsCovered()
    {
        var covered = typeof(ParityTests).GetMethod(nameof(TestDesignMatchesRunTime))!
            .GetCustomAttributes(typeof(InlineDataAttribute), false).Cast<InlineDataAttribute>()
            .Select(a => (string)a.GetData(null!).First()[0]).Concat(new[] { "ParityDesigns.Constructed", "ParityDesigns.Primary" });
        Assert.Equal(TestDesigns.DesignNames.OrderBy(n => n), covered.OrderBy(n => n));
    }

    [Fact]
    public void EverySampleMatchesRunTime()
    {
        var files = Directory.GetFiles(Repository.PathOf("samples"), "*.cs", SearchOption.AllDirectories)
            .Where(p => !p.Contains(Path.DirectorySeparatorChar + "obj" + Path.DirectorySeparatorChar)
                        && !p.Contains(Path.DirectorySeparatorChar + "bin" + Path.DirectorySeparatorChar))
            .OrderBy(p => p).ToArray();
        var samples = InMemoryDesigns.FromFiles(files);
        Assert.NotEmpty(samples.DesignNames);
        // A sample may show PW9001 (StrainLanes does, on a configuration check that makes no devices): its netlist must
        // still match exactly, and nothing else may be reported.
        foreach (var design in samples.DesignNames)
            AssertParity(samples, design, allowNotElaborated: true);
    }

    [Theory]
    [InlineData(DesignShape.StraightLine)]
    [InlineData(DesignShape.Loop)]
    [InlineData(DesignShape.Blocks)]
    public void EveryBenchmarkShapeMatchesRunTime(DesignShape shape)
    {
        // 130 lanes: three gated clocks, so the block shape's closure-written record copy is exercised twice.
        var devices = DesignGenerator.DevicesOf(130);
        var designs = new InMemoryDesigns(("/bench/Generated.cs", DesignGenerator.Generate(shape, devices)));
        AssertParity(designs, "Generated");
        Assert.Equal(devices, designs.CompileTime("Generated").Netlist!.Devices.Count);
        if (shape == DesignShape.Blocks)
            Assert.Contains(designs.CompileTime("Generated").Netlist!.Nets, n => n.Name.StartsWith("lane129.", System.StringComparison.Ordinal));
    }

    internal static void AssertParity(InMemoryDesigns designs, string design, params object[] constructorArguments)
        => AssertParity(designs, design, allowNotElaborated: false, constructorArguments);

    internal static void AssertParity(InMemoryDesigns designs, string design, bool allowNotElaborated, params object[] constructorArguments)
    {
        var compileTime = designs.CompileTime(design);
        var runTime = designs.RunTime(design, constructorArguments);
        Assert.NotNull(compileTime.Netlist);
        Assert.True(runTime.Devices.Count > 0, design + " made no devices at run time");
        var expected = NetlistText.Write(runTime, includeSpans: true).Split('\n');
        var actual = NetlistText.Write(compileTime.Netlist!, includeSpans: true).Split('\n');
        for (var i = 0; i < System.Math.Min(expected.Length, actual.Length); i++)
            Assert.True(expected[i] == actual[i], $"{design}, line {i + 1}:\n  run time:     {expected[i]}\n  compile time: {actual[i]}");
        Assert.Equal(expected.Length, actual.Length);
        var issues = compileTime.Issues.Where(i => !allowNotElaborated || i.RuleId != RuleCatalog.NotElaborated.Id).ToList();
        Assert.True(issues.Count == 0, design + ": " + string.Join("\n", issues));
        Assert.Equal(runTime.Devices.Count, compileTime.Netlist!.Devices.Count);
    }
}
