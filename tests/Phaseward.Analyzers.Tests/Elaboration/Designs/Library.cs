using Phaseward;

namespace ParityDesigns
{
    /// <summary>Helpers in another file than the designs that call them.</summary>
    public static class Cells
    {
        public static Net InverterChain(Circuit c, Net input, int length, string name)
        {
            var x = input;
            for (var i = 0; i < length; i++)
                x = c.Inverter(x, name + i);
            return x;
        }

        public static Net Restore(this Circuit c, Net input, string name) => c.Buffer(input, name);
    }

    /// <summary>Where the designs with constructor parameters are created.</summary>
    public static class Catalog
    {
        public static Design[] All() => new Design[] { new Constructed(5), new Primary(3) };
    }
}
