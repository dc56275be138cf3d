using System.Globalization;

namespace Phaseward.Electrical;

/// <summary>The words a message uses to say which corner its figures are at: "slow corner, delays ×1.3".</summary>
internal static class CornerText
{
    public static string Of(Process process, Corner corner) => corner switch
    {
        Corner.Slow => "slow corner, delays ×" + Factor(process.SlowDelayFactor),
        Corner.Fast => "fast corner, delays ×" + Factor(process.FastDelayFactor),
        _ => "nominal figures",
    };

    private static string Factor(double factor) => factor.ToString("0.###", CultureInfo.InvariantCulture);
}
