using System.IO;
using static Phaseward.Cli.Tests.CliRun;

namespace Phaseward.Cli.Tests;

/// <summary>
/// A design assembly whose recorded source paths are not on this machine: built with the compiler's PathMap option
/// (which rewrites the paths written into the assembly and its PDB, and the caller-file paths the DSL records; csc's
/// documented <c>-pathmap</c>), as CI builds with ContinuousIntegrationBuild are. Its configuration cannot be found,
/// and the report says so instead of passing the defaults off as the project's policy.
/// </summary>
public sealed class MovedSourcesTests
{
    [Fact]
    public void A_path_mapped_assembly_is_reported_with_a_warning_that_its_configuration_was_not_read()
    {
        var directory = NewTempDirectory();
        try
        {
            File.WriteAllText(Path.Combine(directory, "Moved.csproj"), $"""
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup>
                    <TargetFramework>net10.0</TargetFramework>
                    <PathMap>{directory}=/_/</PathMap>
                  </PropertyGroup>
                  <ItemGroup>
                    <Reference Include="Phaseward" HintPath="{Path.Combine(System.AppContext.BaseDirectory, "Phaseward.dll")}" />
                  </ItemGroup>
                </Project>
                """);
            // The project's policy: PW1001 is an error. The report cannot see it from the assembly alone.
            File.WriteAllText(Path.Combine(directory, ".editorconfig"), "root = true\n\n[*.cs]\ndotnet_diagnostic.PW1001.severity = error\n");
            File.WriteAllText(Path.Combine(directory, "Tally.cs"), """
                namespace Moved
                {
                    /// <summary>Demo design, invented figures: two latches in the same phase (PW1001).</summary>
                    public sealed class Tally : Phaseward.Design
                    {
                        protected override void Describe(Phaseward.Circuit c)
                        {
                            var tick = c.Clock("tick", Phaseward.UnitExtensions.Nanoseconds(10));
                            var early = c.StaticLatch(c.Input("bit"), tick.High, "early");
                            c.Output("out", c.StaticLatch(c.Inverter(early), tick.High, "late"));
                        }
                    }
                }
                """);
            var build = System.Diagnostics.Process.Start(new System.Diagnostics.ProcessStartInfo("dotnet", "build -nologo -v q -o out") { WorkingDirectory = directory, RedirectStandardOutput = true, RedirectStandardError = true })!;
            var buildOutput = build.StandardOutput.ReadToEnd() + build.StandardError.ReadToEnd();
            build.WaitForExit();
            Assert.True(build.ExitCode == 0, buildOutput);

            var run = Of(Path.Combine(directory, "out", "Moved.dll"));

            Assert.Contains("/_/", run.Out, System.StringComparison.Ordinal); // the mapped path is what the assembly records
            Assert.Contains("are not on this machine", run.Err, System.StringComparison.Ordinal);
            Assert.Contains("no .editorconfig or .globalconfig was read", run.Err, System.StringComparison.Ordinal);
            Assert.Equal(ReportCommand.Clean, run.ExitCode); // PW1001 at its default severity (warning), as the warning says

            // Sources that are here: no such warning.
            Assert.DoesNotContain("not on this machine", Of(QuorvaneDll).Err, System.StringComparison.Ordinal);
        }
        finally
        {
            Directory.Delete(directory, recursive: true);
        }
    }
}
