using Phaseward;

namespace Quorvane;

/// <summary>
/// Clean, and shows <see cref="Circuit.Exclusive"/>. The logbook's phase aligner rotates a 4-bit wave-phase sample by
/// 0 to 3 places with a one-hot barrel shifter: a 2-to-4 decoder turns the rotate amount into four selects, exactly
/// one of them high. Every sampled bit feeds four pass gates, one per select; stating the selects exclusive lets the
/// delay model count only the conducting branch at each bit (the other three are off) instead of assuming all four
/// load it, and tells the fighting-driver check that the arms of each output mux never conduct together.
/// Figures are invented.
/// </summary>
public sealed class PhaseAligner : Design
{
    private const int Bits = 4;

    protected override void Describe(Circuit c)
    {
        c.UseProcess(QuorvaneProcess.Figures());
        var clk = c.Clock("align", 4.Nanoseconds());

        var amount0 = c.Input("amount0");
        var amount1 = c.Input("amount1");
        var amount0Bar = c.Inverter(amount0, "amount0_b");
        var amount1Bar = c.Inverter(amount1, "amount1_b");
        var rotate = new[]
        {
            c.Nor(amount1, amount0, "rotate0"),
            c.Nor(amount1, amount0Bar, "rotate1"),
            c.Nor(amount1Bar, amount0, "rotate2"),
            c.Nor(amount1Bar, amount0Bar, "rotate3"),
        };
        c.Exclusive(rotate);

        var sampled = new Net[Bits];
        for (var i = 0; i < Bits; i++)
            sampled[i] = c.StaticLatch(c.Input($"phase{i}"), clk.Low, $"sample{i}");

        for (var j = 0; j < Bits; j++)
        {
            var bit = c.Node($"aligned{j}_mux");
            for (var k = 0; k < Bits; k++)
                c.TransmissionGate(sampled[(j - k + Bits) % Bits], rotate[k], bit);
            c.Output($"aligned{j}", c.StaticLatch(c.Inverter(bit, $"aligned{j}_in"), clk.High, $"aligned{j}"));
        }
    }
}
