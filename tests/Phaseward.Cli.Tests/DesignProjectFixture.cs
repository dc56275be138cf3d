using System;
using System.IO;

namespace Phaseward.Cli.Tests;

/// <summary>
/// A small design project written to a temporary folder and built once for real with the report's own project path
/// (dotnet build): designs that throw, have no clocks, or cannot be instantiated, and a clean one. It references the
/// Phaseward.dll beside the tests, so loading it also proves that the design's Phaseward resolves to the tool's.
/// </summary>
public sealed class DesignProjectFixture : IDisposable
{
    public const string ThrowMessage = "calibration table for strain lane 9 is missing";

    public DesignProjectFixture()
    {
        Directory = CliRun.NewTempDirectory();
        Project = Path.Combine(Directory, "Fixture.Designs.csproj");
        File.WriteAllText(Project, $"""
            <Project Sdk="Microsoft.NET.Sdk">
              <PropertyGroup>
                <TargetFramework>net10.0</TargetFramework>
                <Nullable>enable</Nullable>
              </PropertyGroup>
              <ItemGroup>
                <Reference Include="Phaseward" HintPath="{Path.Combine(AppContext.BaseDirectory, "Phaseward.dll")}" />
              </ItemGroup>
            </Project>
            """);
        File.WriteAllText(Path.Combine(Directory, "Designs.cs"), """
            using Phaseward;

            namespace Fixture
            {
                public sealed class Throws : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        c.Clock("strobe", 8.Nanoseconds());
                        throw new System.InvalidOperationException("calibration table for strain lane 9 is missing");
                    }
                }

                public sealed class NoClocks : Design
                {
                    protected override void Describe(Circuit c) => c.Output("y", c.Inverter(c.Input("a")));
                }

                public sealed class NeedsArgument : Design
                {
                    private readonly int lanes;

                    public NeedsArgument(int lanes) => this.lanes = lanes;

                    protected override void Describe(Circuit c) => c.Clock("strobe", lanes.Nanoseconds());
                }

                public sealed class TwoRoots : Design
                {
                    protected override void Describe(Circuit c)
                    {
                        var fast = c.Clock("fast", 2.Nanoseconds());
                        var slow = c.Clock("slow", 6.Nanoseconds());
                        var a = c.StaticLatch(c.Input("a"), fast.High, "fast_capture");
                        var b = c.StaticLatch(c.Input("b"), slow.Low, "slow_capture");
                        c.Output("y", c.Nand(a, b));
                    }
                }
            }
            """);
        var artifacts = Path.Combine(Directory, "artifacts");
        System.IO.Directory.CreateDirectory(artifacts);
        Assembly = Loading.ProjectBuilder.Build(Project, artifacts, TextWriter.Null).AssemblyPath;
    }

    public string Directory { get; }

    public string Project { get; }

    /// <summary>The built assembly.</summary>
    public string Assembly { get; }

    public void Dispose()
    {
        try
        {
            System.IO.Directory.Delete(Directory, recursive: true);
        }
        catch (IOException)
        {
        }
    }
}
