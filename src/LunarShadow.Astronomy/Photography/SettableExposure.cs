using System.Globalization;

namespace LunarShadow.Astronomy.Photography;

/// <summary>
/// An exposure as a camera can be set: the third-stop ISO and marked shutter time nearest the computed ones, and how far
/// the result is from the computed exposure.
/// </summary>
/// <param name="ShutterLabel">The shutter as the camera shows it ("1/125 s", "0.3 s", "2.5 s"; beyond 30 s, whole seconds on bulb, "47 s bulb").</param>
/// <param name="ShutterSeconds">The time that marking stands for (1/125 s is 2⁻⁷ s), or the bulb time.</param>
/// <param name="Iso">The ISO as the camera shows it (ISO 12232's arithmetic series, 25 to 409600).</param>
/// <param name="OffStops">Settable exposure over computed exposure, in stops (positive: brighter); within ±1/6 stop unless the camera's limits forced more.</param>
/// <param name="BracketLabels">The bracket's shutter times set the same way, one for each of the exposure's bracket shutters, darkest first.</param>
public sealed record SettableExposure(string ShutterLabel, double ShutterSeconds, double Iso, double OffStops, IReadOnlyList<string> BracketLabels)
{
    // Common practice: the shutter times marked on camera dials and menus in third stops, 1/64000 s to 30 s; each marking
    // stands for 2^(k/3) s (1/125 for 2⁻⁷, 1/60 for 2⁻⁶). Index 0 is k = −48.
    private static readonly string[] ShutterMarks =
    [
        "1/64000", "1/51200", "1/40000", "1/32000", "1/25600", "1/20000", "1/16000", "1/12800", "1/10000",
        "1/8000", "1/6400", "1/5000", "1/4000", "1/3200", "1/2500", "1/2000", "1/1600", "1/1250", "1/1000", "1/800", "1/640",
        "1/500", "1/400", "1/320", "1/250", "1/200", "1/160", "1/125", "1/100", "1/80", "1/60", "1/50", "1/40", "1/30", "1/25",
        "1/20", "1/15", "1/13", "1/10", "1/8", "1/6", "1/5", "1/4", "0.3", "0.4", "0.5", "0.6", "0.8", "1", "1.3", "1.6", "2",
        "2.5", "3.2", "4", "5", "6", "8", "10", "13", "15", "20", "25", "30",
    ];

    private const int FirstShutterThirds = -48;

    // ISO 12232 (arithmetic speed series, common on cameras): ISO 100·2^(k/3) marked as below. Index 0 is k = −6 (ISO 25).
    private static readonly double[] IsoMarks =
    [
        25, 32, 40, 50, 64, 80, 100, 125, 160, 200, 250, 320, 400, 500, 640, 800, 1000, 1250, 1600, 2000, 2500, 3200, 4000, 5000,
        6400, 8000, 10000, 12800, 16000, 20000, 25600, 32000, 40000, 51200, 64000, 80000, 102400, 128000, 160000, 204800,
        256000, 320000, 409600,
    ];

    private const int FirstIsoThirds = -6;

    // The longest marked time; past it the shutter is held open on bulb for whole seconds.
    private const double LongestMarkedSeconds = 30;

    /// <summary>
    /// The settable exposure nearest a computed one: the ISO goes to the nearest third stop; a shutter the camera chose
    /// (not fixed by the photographer) then takes up the difference and goes to the nearest marked time within the
    /// camera's range; a fixed shutter stays as given.
    /// </summary>
    public static SettableExposure For(Exposure exposure, Camera camera)
    {
        var isoThirds = NearestThirds(exposure.Iso / 100, FirstIsoThirds, IsoMarks.Length);
        var iso = 100 * Math.Pow(2, isoThirds / 3.0);
        var isoFactor = exposure.Iso / iso;
        var (label, seconds) = camera.ShutterSeconds is { } fixedShutter
            ? (Label(fixedShutter), fixedShutter)
            : Shutter(exposure.ShutterSeconds * isoFactor, camera);
        var bracket = exposure.BracketShutters.Select(t => camera.ShutterSeconds is null ? Shutter(t * isoFactor, camera).Label : Label(t))
            .ToList();
        var off = Math.Log2(seconds * iso / (exposure.ShutterSeconds * exposure.Iso));
        return new SettableExposure(label, seconds, IsoMarks[isoThirds - FirstIsoThirds], off, bracket);
    }

    // The marked time nearest t (in stops) within the camera's range; beyond 30 s, whole seconds on bulb.
    private static (string Label, double Seconds) Shutter(double seconds, Camera camera)
    {
        if (seconds > LongestMarkedSeconds * Math.Pow(2, 1 / 6.0))
        {
            var bulb = Math.Min(Math.Round(seconds), Math.Floor(camera.SlowestShutterSeconds));
            return (string.Create(CultureInfo.InvariantCulture, $"{bulb:0} s bulb"), bulb);
        }
        var thirds = NearestThirds(seconds, FirstShutterThirds, ShutterMarks.Length);
        // Keep within the camera's range (a marking within a sixth of a stop of a limit counts as that limit).
        var tolerance = Math.Pow(2, 1 / 6.0);
        while (Math.Pow(2, thirds / 3.0) < camera.FastestShutterSeconds / tolerance && thirds - FirstShutterThirds < ShutterMarks.Length - 1) thirds++;
        while (Math.Pow(2, thirds / 3.0) > camera.SlowestShutterSeconds * tolerance && thirds > FirstShutterThirds) thirds--;
        return (ShutterMarks[thirds - FirstShutterThirds] + " s", Math.Pow(2, thirds / 3.0));
    }

    // The label of a time the photographer gave: its marking when it is one (markings lie within 0.1 stop of the times
    // they stand for: 1/60 for 1/64), else the time itself.
    private static string Label(double seconds)
    {
        if (seconds <= LongestMarkedSeconds * 1.01)
        {
            var thirds = NearestThirds(seconds, FirstShutterThirds, ShutterMarks.Length);
            if (Math.Abs(Math.Log2(seconds) - thirds / 3.0) < 0.1) return ShutterMarks[thirds - FirstShutterThirds] + " s";
        }
        return seconds >= 1
            ? string.Create(CultureInfo.InvariantCulture, $"{seconds:0.#} s")
            : string.Create(CultureInfo.InvariantCulture, $"1/{1 / seconds:0} s");
    }

    // The whole number of thirds of a stop nearest log₂(value), kept within a table of the given start and length.
    private static int NearestThirds(double value, int first, int count) =>
        (int)Math.Clamp(Math.Round(3 * Math.Log2(value)), first, first + count - 1);
}
