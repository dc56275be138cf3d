using System;
using System.Linq;
using Phaseward.Electrical;
using Phaseward.Tests.Reference;

namespace Phaseward.Tests.Electrical;

/// <summary>
/// Elmore and the ln 2 × Elmore 50 % estimate against two independent references: the exact step response computed
/// here with MathNet.Numerics, and the ngspice-39 values in tests/reference/ngspice (netlists and regenerate.sh there).
/// </summary>
/// <remarks>
/// The bound: for an RC tree driven by a step, the Elmore delay is an upper bound on the 50 % delay at every node —
/// R. Gupta, B. Tutuianu, L. T. Pileggi, "The Elmore Delay as a Bound for RC Trees with Generalized Input Signals",
/// IEEE Trans. CAD 16(1), 1997 (citation from memory, as in the reference README; not verified against the paper).
/// </remarks>
public class FiftyPercentDelayTests
{
    /// <summary>
    /// How closely MathNet's exact response and ngspice must agree: the CSV keeps 7 significant digits (rounding up to
    /// 5e-7 relative) and ngspice runs at reltol = 1e-6; the largest difference on the committed data is 4.5e-7. A
    /// mis-copied resistor or capacitor anywhere in a tree moves a leaf's t50 by far more (see
    /// <see cref="A_miscopied_side_branch_moves_the_leaf_far_beyond_the_tolerance"/>).
    /// </summary>
    private const double AgreementTolerance = 2e-6;

    public static TheoryData<int> Sections => new(Enumerable.Range(1, 16));

    [Theory]
    [MemberData(nameof(Sections))]
    public void Exact_step_response_agrees_with_ngspice_on_the_ladders(int sections)
    {
        var row = NgspiceReference.Ladders.Single(r => r.Sections == sections);
        var exact = ExactStepResponse.UniformLadder(sections, row.Ohms, row.Farads).FiftyPercentTime(sections - 1);
        Assert.True(Math.Abs(exact - row.T50Seconds) <= AgreementTolerance * row.T50Seconds,
            $"N={sections}: MathNet t50 {exact:R} s vs ngspice {row.T50Seconds:R} s, relative {(exact - row.T50Seconds) / row.T50Seconds:E2}");
    }

    [Theory]
    [MemberData(nameof(Sections))]
    public void Elmore_bounds_the_fifty_percent_delay_of_the_ladders(int sections)
    {
        var row = NgspiceReference.Ladders.Single(r => r.Sections == sections);
        var elmore = ElmoreDelay.Compute(ReferenceTrees.UniformLadder(sections, new Resistance(row.Ohms), new Capacitance(row.Farads)))[sections - 1];
        var exact = ExactStepResponse.UniformLadder(sections, row.Ohms, row.Farads).FiftyPercentTime(sections - 1);
        Assert.True(elmore.Seconds >= row.T50Seconds, $"N={sections}: Elmore {elmore} below ngspice t50 {row.T50Seconds:R} s");
        Assert.True(elmore.Seconds >= exact, $"N={sections}: Elmore {elmore} below exact t50 {exact:R} s");
    }

    // One section is a single pole: t50 = ln 2 · RC exactly (basic circuit theory), and ngspice reproduces it to 7 digits.
    [Fact]
    public void Single_section_estimate_is_exact()
    {
        var row = NgspiceReference.Ladders.Single(r => r.Sections == 1);
        var estimate = FiftyPercentDelay.FromElmore(ElmoreDelay.Compute(ReferenceTrees.UniformLadder(1, new Resistance(row.Ohms), new Capacitance(row.Farads)))[0]);
        // 0.69 is ln 2 (0.6931) rounded, as the textbooks write t_p = 0.69·R·C: 0.45 % below the exact single pole.
        Assert.InRange(estimate.Seconds / row.T50Seconds, 0.995, 1.0);
        Assert.Equal(0.69, FiftyPercentDelay.SinglePoleFactor);
        Assert.InRange(Math.Log(2) / FiftyPercentDelay.SinglePoleFactor, 1.0, 1.005);
    }

    // For longer ladders ln 2 × Elmore falls below the true 50 % delay: t50/Elmore climbs from 0.693 (N = 1) to about
    // 0.757 (N ≥ 8) in the reference data, so the estimate is low by at most 1 − 0.693/0.757 ≈ 8.5 %. The test pins that
    // behaviour (low, and within 9 %) so a change in the model shows up here and in the rule's documentation.
    [Theory]
    [MemberData(nameof(Sections))]
    public void Estimate_is_within_nine_percent_below_the_ladder_reference(int sections)
    {
        var row = NgspiceReference.Ladders.Single(r => r.Sections == sections);
        var estimate = FiftyPercentDelay.FromElmore(ElmoreDelay.Compute(ReferenceTrees.UniformLadder(sections, new Resistance(row.Ohms), new Capacitance(row.Farads)))[sections - 1]);
        var error = (estimate.Seconds - row.T50Seconds) / row.T50Seconds;
        Assert.InRange(error, -0.09, 1e-6);
    }

    [Theory]
    [InlineData("rc_tree_a", "a2")]
    [InlineData("rc_tree_a", "b4")]
    [InlineData("rc_tree_b", "c1")]
    [InlineData("rc_tree_b", "e2")]
    [InlineData("rc_tree_b", "f1")]
    [InlineData("rc_tree_b", "g3")]
    public void Trees_exact_response_agrees_with_ngspice_and_Elmore_bounds_both(string tree, string leaf)
    {
        var (rc, nodes) = tree == "rc_tree_a" ? ReferenceTrees.TreeA() : ReferenceTrees.TreeB();
        var spice = NgspiceReference.TreeT50(tree, leaf);
        var exact = ExactStepResponse.Of(rc).FiftyPercentTime(nodes[leaf]);
        var elmore = ElmoreDelay.Compute(rc)[nodes[leaf]].Seconds;

        Assert.True(Math.Abs(exact - spice) <= AgreementTolerance * spice, $"{tree}/{leaf}: MathNet {exact:R} s vs ngspice {spice:R} s, relative {(exact - spice) / spice:E2}");
        Assert.True(elmore >= spice && elmore >= exact, $"{tree}/{leaf}: Elmore {elmore:R} s below t50 {spice:R} s");
        // In a branched tree the ln 2 estimate can land on either side; on these trees it is within 15 % of ngspice
        // (t50/Elmore runs from 0.604 to 0.763 in the README's table).
        Assert.InRange((FiftyPercentDelay.FromElmore(new Time(elmore)).Seconds - spice) / spice, -0.15, 0.15);
    }

    // A test of the tolerance: tree B with one side branch mis-copied by 10 % (f1's 2 fF read as 2.2 fF, on a branch
    // that leaf g3 does not lie on). Leaf g3's exact t50 moves by about 8e-5: ten times the MathNet-vs-ngspice tolerance
    // and more, so such a slip in ReferenceTrees or in the netlist fails the comparison above, while a 0.5 % tolerance
    // would have let it through.
    [Fact]
    public void A_miscopied_side_branch_moves_the_leaf_far_beyond_the_tolerance()
    {
        var (tree, nodes) = ReferenceTrees.TreeB();
        var miscopied = new RcTree(1.Kiloohms(), 2.Femtofarads());
        var s = RcTree.Root;
        miscopied.AddBranch(s, 20.Kiloohms(), 10.Femtofarads());
        var d1 = miscopied.AddBranch(s, 5.Kiloohms(), 5.Femtofarads());
        miscopied.AddBranch(miscopied.AddBranch(d1, 8.Kiloohms(), 6.Femtofarads()), 8.Kiloohms(), 6.Femtofarads());
        miscopied.AddBranch(d1, 30.Kiloohms(), new Capacitance(2.2e-15));
        var g3 = miscopied.AddBranch(miscopied.AddBranch(miscopied.AddBranch(s, 3.Kiloohms(), 3.Femtofarads()), 3.Kiloohms(), 3.Femtofarads()), 3.Kiloohms(), 3.Femtofarads());

        var right = ExactStepResponse.Of(tree).FiftyPercentTime(nodes["g3"]);
        var wrong = ExactStepResponse.Of(miscopied).FiftyPercentTime(g3);
        Assert.Equal(nodes["g3"], g3);
        var moved = Math.Abs(wrong - right) / right;
        Assert.True(moved > 10 * AgreementTolerance, $"g3 moved by only {moved:E2}");
        Assert.True(moved < 0.005, $"g3 moved by {moved:E2}: pick a subtler slip to show what a 0.5 % tolerance misses");
    }
}
