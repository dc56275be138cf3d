using System.Linq;

namespace Phaseward.Analyzers.Tests.Rules;

/// <summary>
/// Shared pieces of the rule tests' sources. Every design uses the same test-only process, chosen so that stage delays
/// are round by hand (the same figures as the rule tests in tests/Phaseward.Tests): every net is 10 fF, pass gates are
/// 5 kΩ and restoring stages 4 kΩ, so t_TG = 0.69 · 5 kΩ · 10 fF = 34.5 ps and t_inv = 0.69 · 4 kΩ · 10 fF = 27.6 ps
/// (t = 0.69·R·C: Rabaey, Chandrakasan, Nikolić, "Digital Integrated Circuits: A Design Perspective", 2nd ed., ch. 5,
/// from memory). Both corners are nominal (delay factors 1) so the figures stay round; corner tests set their own
/// factors. Test figures, not a real process.
/// </summary>
internal static class RuleSources
{
    /// <summary>A design class named <paramref name="name"/> whose Describe uses the flat test process, then runs
    /// <paramref name="body"/>; <paramref name="members"/> (helper methods) follow Describe.</summary>
    public static string Design(string name, string body, string members = "") => $$"""
        using Phaseward;

        public sealed class {{name}} : Design
        {
            protected override void Describe(Circuit c)
            {
                c.UseProcess(new Process
                {
                    Name = "flat 10 fF (test figures)",
                    WireCapacitance = 10.Femtofarads(),
                    GateCapacitance = 0.Femtofarads(),
                    DiffusionCapacitance = 0.Femtofarads(),
                    PassGateResistance = 5.Kiloohms(),
                    DriverResistance = 4.Kiloohms(),
                    SlowDelayFactor = 1,
                    FastDelayFactor = 1,
                });
        {{Indent(body, "        ")}}
            }
        {{Indent(members, "    ")}}
        }
        """;

    private static string Indent(string body, string prefix)
        => string.Join("\n", body.Replace("\r\n", "\n").Split('\n').Select(l => l.Length == 0 ? l : prefix + l));
}
