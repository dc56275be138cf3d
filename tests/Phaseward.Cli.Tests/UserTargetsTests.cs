using System.IO;
using Phaseward.Cli.Loading;

namespace Phaseward.Cli.Tests;

/// <summary>
/// The report's build adds its own targets file through MSBuild's CustomAfterMicrosoftCommonTargets (a documented hook
/// of Microsoft.Common.targets, imported after the project's settings). A project that uses the same hook for its own
/// targets must still get them: here they define the symbol the design needs to compile.
/// </summary>
public sealed class UserTargetsTests
{
    [Fact]
    public void A_projects_own_custom_after_targets_file_is_still_imported()
    {
        var directory = CliRun.NewTempDirectory();
        try
        {
            File.WriteAllText(Path.Combine(directory, "frost.targets"), """
                <Project>
                  <PropertyGroup>
                    <DefineConstants>$(DefineConstants);FROST_LANES</DefineConstants>
                  </PropertyGroup>
                </Project>
                """);
            File.WriteAllText(Path.Combine(directory, "Directory.Build.props"), """
                <Project>
                  <PropertyGroup>
                    <CustomAfterMicrosoftCommonTargets>frost.targets</CustomAfterMicrosoftCommonTargets>
                  </PropertyGroup>
                </Project>
                """);
            var project = Path.Combine(directory, "Frost.csproj");
            File.WriteAllText(project, $"""
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                  </PropertyGroup>
                  <ItemGroup>
                    <Reference Include="Phaseward" HintPath="{Path.Combine(System.AppContext.BaseDirectory, "Phaseward.dll")}" />
                  </ItemGroup>
                </Project>
                """);
            File.WriteAllText(Path.Combine(directory, "Frost.cs"), """
                #if !FROST_LANES
                #error the project's own targets file (CustomAfterMicrosoftCommonTargets) was not imported
                #endif
                namespace Frost
                {
                    /// <summary>Demo design, invented figures.</summary>
                    public sealed class Counter : Phaseward.Design
                    {
                        protected override void Describe(Phaseward.Circuit c) => c.Output("y", c.Inverter(c.Input("a")));
                    }
                }
                """);
            var artifacts = Path.Combine(directory, "artifacts");
            Directory.CreateDirectory(artifacts);

            var built = ProjectBuilder.Build(project, artifacts, TextWriter.Null);

            Assert.True(File.Exists(built.AssemblyPath), built.AssemblyPath);
            Assert.Contains("frost.targets", File.ReadAllText(Path.Combine(artifacts, "phaseward-report.targets")), System.StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(directory, recursive: true);
        }
    }
}
