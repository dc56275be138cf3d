namespace Phaseward.Analyzers.Tests.Elaboration;

/// <summary>
/// Arithmetic and conversions on every numeric type, each design elaborated exactly as the compiled design runs it
/// (the oracle: the design compiled and run by .NET, <see cref="ParityTests"/>): byte, sbyte, short, ushort and char
/// widen to int and wrap back when stored (b += 10, c++), uint and ulong wrap or throw in their own arithmetic, decimal
/// always throws on overflow, and a cast to a narrower type keeps the low bits unchecked and throws checked. Before, a
/// cast to byte, sbyte, short, ushort, uint, ulong or decimal kept the value unchanged ((byte)300 stayed 300, silently),
/// and the arithmetic was PW9001.
/// </summary>
public class NumericWidthsTests
{
    [Theory]
    [InlineData("Widths.NarrowCasts")]
    [InlineData("Widths.CheckedCasts")]
    [InlineData("Widths.SmallTypesWrapWhenStored")]
    [InlineData("Widths.Characters")]
    [InlineData("Widths.Unsigned")]
    [InlineData("Widths.UnsignedOverflow")]
    [InlineData("Widths.Decimals")]
    [InlineData("Widths.FloatingToIntegers")]
    public void RunsAsAtRunTime(string design) => ParityTests.AssertParity(Designs, design);

    private static readonly InMemoryDesigns Designs = new(("/widths/Widths.cs", """
            using System;
            using Phaseward;

            namespace Widths
            {
                public abstract class Base : Design { protected void Chain(Circuit c, long n, string p) { var x = c.Input(p + "in"); for (var i = 0; i < n; i++) x = c.Inverter(x, p + i); c.Output(p + "out", x); } }
                public sealed class NarrowCasts : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var x = 300;
                        var big = 5_000_000_000L;
                        byte b = (byte)x;
                        sbyte s = (sbyte)(x - 100);
                        short h = (short)(x * 300);
                        ushort u = (ushort)(-x);
                        var one = 1;
                        uint w = (uint)(-one);
                        int i = (int)big;
                        var two = 2L;
                        ulong ul = (ulong)(-two);
                        Chain(c, b + (s + 128) % 7 + (h & 15) + u % 11 + w % 13 + (i & 7) + (long)(ul % 17), "nc");
                    }
                }
                public sealed class CheckedCasts : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var caught = 0;
                        var x = 300;
                        try { _ = checked((byte)x); } catch (OverflowException) { caught += 1; }
                        try { _ = checked((uint)(x - 301)); } catch (OverflowException) { caught += 2; }
                        try { _ = checked((ushort)x); } catch (OverflowException) { caught += 4; }
                        try { _ = checked((sbyte)(x - 400)); } catch (OverflowException) { caught += 8; }
                        Chain(c, caught, "cc");
                    }
                }
                public sealed class SmallTypesWrapWhenStored : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        byte b = 250; b += 10;
                        sbyte s = 127; s++;
                        short h = 30000; h += 10000;
                        ushort u = 1; u -= 2;
                        byte m = 200; m *= 2;
                        byte r = 1; r <<= 9;
                        Chain(c, b + (s + 128) + (h & 31) + u % 9 + m % 10 + r, "sw");
                    }
                }
                public sealed class Characters : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var ch = 'a';
                        ch++;
                        ch += (char)2;
                        var lane = (char)('A' + 3);
                        var name = "lane_" + ch + lane + (char)(lane + 1);
                        c.Inverter(c.Input("letter"), name);
                        Chain(c, ch - 'a', "ch");
                    }
                }
                public sealed class Unsigned : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        uint u = 0; u--;
                        uint shifted = 0x80000000u >> 33;
                        ulong ul = ulong.MaxValue; ul += 2;
                        var seventy = 70000u;
                        uint product = seventy * seventy;
                        var compare = (u > 5u ? 1 : 0) + (ul < 2ul ? 2 : 0);
                        Chain(c, u % 7 + shifted % 11 + (long)ul + product % 13 + compare + (~0u) % 5, "un");
                    }
                }
                public sealed class UnsignedOverflow : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var caught = 0;
                        uint u = 0;
                        ulong big = ulong.MaxValue;
                        try { checked { u--; } } catch (OverflowException) { caught += 1; }
                        try { checked { big += 1; } } catch (OverflowException) { caught += 2; }
                        try { var zero = 0u; _ = 5u / zero; } catch (DivideByZeroException) { caught += 4; }
                        Chain(c, caught, "uo");
                    }
                }
                public sealed class Decimals : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var m = 0.1m + 0.2m;
                        var exact = m == 0.3m ? 1 : 0;
                        var tenths = (int)(m * 10);
                        var third = 1m / 3m;
                        var caught = 0;
                        var maxM = decimal.MaxValue;
                        try { _ = maxM + 1m; } catch (OverflowException) { caught = 1; }
                        try { _ = (int)(maxM / 2); } catch (OverflowException) { caught += 2; }
                        var rounded = (int)Math.Round(2.5m);
                        Chain(c, exact + tenths + (third * 3 == 1m ? 10 : 20) + caught + rounded + (int)(-m * -10), "dm");
                    }
                }
                public sealed class FloatingToIntegers : Base
                {
                    protected override void Describe(Circuit c)
                    {
                        var d = 3.99;
                        var f = 2.5f;
                        var caught = 0;
                        var e = 1e12;
                        try { _ = checked((int)e); } catch (OverflowException) { caught = 1; }
                        Chain(c, (int)d + (byte)d + (long)f + (uint)(d * 2) + (short)(-d + 10) + caught + (int)(decimal)d, "fi");
                    }
                }
            }
            """));
}
