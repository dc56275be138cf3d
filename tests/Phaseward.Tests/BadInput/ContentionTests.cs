using Phaseward.Tests.Support;

namespace Phaseward.Tests.BadInput;

// Two restoring stages on one net short the supply through the fighting transistors (common practice), so a second
// restoring driver is refused at once, naming the net.
public class ContentionTests
{
    private readonly Populated p = new();

    private void Refused(System.Action call) => Rejection.Argument(p.Circuit, call, "output", "'y'", "restoring");

    [Fact]
    public void A_second_restoring_stage_on_a_driven_net_is_refused_whatever_its_kind()
    {
        var c = p.Circuit;
        Refused(() => c.Inverter(p.B, p.Driven));
        Refused(() => c.Buffer(p.B, p.Driven));
        Refused(() => c.Nand(p.A, p.B, p.Driven));
        Refused(() => c.Nor(p.A, p.B, p.Driven));
    }

    [Fact]
    public void A_net_driven_through_the_existing_net_form_is_guarded_too()
    {
        var c = p.Circuit;
        c.Nand(p.A, p.B, p.Node);

        Rejection.Argument(c, () => c.Inverter(p.A, p.Node), "output", "'n'");
    }

    [Fact]
    public void A_cell_output_is_already_driven_by_the_cell_inverter()
    {
        var c = p.Circuit;
        Rejection.Argument(c, () => c.Inverter(p.A, p.Latch), "output", "'q'");
        var feedback = c.ToNetlist().Net("q.fb");
        Rejection.Argument(c, () => c.Buffer(p.A, feedback), "output", "'q.fb'");
    }

    [Fact]
    public void A_restoring_stage_on_a_primary_input_is_refused()
    {
        var c = p.Circuit;
        Rejection.Argument(c, () => c.Inverter(p.B, p.A), "output", $"'{p.A.Name}'", "primary input");
    }
}
