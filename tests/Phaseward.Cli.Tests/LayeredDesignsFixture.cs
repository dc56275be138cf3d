using System;
using System.IO;

namespace Phaseward.Cli.Tests;

/// <summary>
/// A design project in a temporary folder with its sources in nested folders, built once through the report's own
/// build path: <c>Designs/SwellCounter.cs</c> (two latches transparent in the same phase: PW1001) and
/// <c>Designs/Routes/MastRoute.cs</c> (six pass gates in series: PW2001). Tests write analyzer config files around it
/// and report on the built assembly, whose symbols point at these sources.
/// </summary>
public sealed class LayeredDesignsFixture : IDisposable
{
    public LayeredDesignsFixture()
    {
        Directory = CliRun.NewTempDirectory();
        Project = Path.Combine(Directory, "Layered.Designs.csproj");
        System.IO.Directory.CreateDirectory(Path.Combine(Directory, "Designs", "Routes"));
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
        File.WriteAllText(Path.Combine(Directory, "Designs", "SwellCounter.cs"), """
            using Phaseward;

            namespace Layered;

            /// <summary>Demo design, invented figures: two pipeline latches both open while the tick is high.</summary>
            public sealed class SwellCounter : Design
            {
                protected override void Describe(Circuit c)
                {
                    var tick = c.Clock("tick", 10.Nanoseconds());
                    var early = c.StaticLatch(c.Input("swell_bit"), tick.High, "early");
                    var late = c.StaticLatch(c.Inverter(early), tick.High, "late");
                    c.Output("swell_out", late);
                }
            }
            """);
        File.WriteAllText(Path.Combine(Directory, "Designs", "Routes", "MastRoute.cs"), """
            using Phaseward;

            namespace Layered;

            /// <summary>Demo design, invented figures: a status bit routed through six mast switches.</summary>
            public sealed class MastRoute : Design
            {
                protected override void Describe(Circuit c)
                {
                    var open = c.Input("mast_open");
                    var line = c.Input("status_bit");
                    for (var hop = 0; hop < 6; hop++)
                        line = c.TransmissionGate(line, open, $"hop{hop}");
                    c.Output("status_out", c.Inverter(line));
                }
            }
            """);
        File.WriteAllText(Path.Combine(Directory, "Designs", "Beacons.cs"), """
            using Phaseward;

            namespace Layered;

            /// <summary>Demo designs, invented figures: two beacon drivers in one file (options are per file).</summary>
            public sealed class BowBeacon : Design
            {
                protected override void Describe(Circuit c) => c.Output("bow_lamp", c.Inverter(c.Input("bow_on")));
            }

            public sealed class SternBeacon : Design
            {
                protected override void Describe(Circuit c) => c.Output("stern_lamp", c.Inverter(c.Input("stern_on")));
            }
            """);
        var artifacts = Path.Combine(Directory, "artifacts");
        System.IO.Directory.CreateDirectory(artifacts);
        Assembly = Loading.ProjectBuilder.Build(Project, artifacts, TextWriter.Null).AssemblyPath;
    }

    public string Directory { get; }

    public string Project { get; }

    /// <summary>The built assembly (with its portable PDB beside it).</summary>
    public string Assembly { get; }

    /// <summary>Writes (or, with null, deletes) a config file relative to the project folder.</summary>
    public void Write(string relativePath, string? text)
    {
        var path = Path.Combine(Directory, relativePath);
        if (text is null) File.Delete(path);
        else File.WriteAllText(path, text);
    }

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
