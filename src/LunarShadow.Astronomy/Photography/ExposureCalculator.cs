namespace LunarShadow.Astronomy.Photography;

/// <summary>A suggested exposure.</summary>
/// <param name="ShutterSeconds">Shutter time, s, within the camera's range.</param>
/// <param name="Iso">ISO speed.</param>
/// <param name="Aperture">f-number (effective).</param>
/// <param name="Ev100">Exposure value at ISO 100 of the target (after placement).</param>
/// <param name="BracketShutters">Shutter times of the bracket, darkest first, each within the camera's range (distinct).</param>
/// <param name="Warnings">What was changed to stay within the camera's and the sky's limits, and what could not be helped.</param>
public sealed record Exposure(double ShutterSeconds, double Iso, double Aperture, double Ev100, IReadOnlyList<double> BracketShutters, IReadOnlyList<PhotoWarning> Warnings)
{
    /// <summary>True when a fixed shutter needed an ISO outside 25–409600 (clamped).</summary>
    public bool IsoClamped => Warnings.Any(w => w.Code == PhotoWarningCode.IsoOutOfRange);
}

/// <summary>The photographic exposure equation, within the camera's settable range and the sky's brightness.</summary>
public static class ExposureCalculator
{
    // ISO 2720:1974: reflected-light meter calibration N²/t = L·S/K, with K = 12.5 cd·s/m² (common for camera meters).
    /// <summary>The reflected-light calibration constant K.</summary>
    public const double MeterConstant = 12.5;

    // Common practice: the sunlit lunar surface is rendered about one stop brighter than the middle grey a meter aims for
    // (this places the suggestion between the NASA guide's Q = 8 and the "looney 11" rule; tested against both).
    /// <summary>Stops added to the metered exposure so the lit surface renders light grey, not middle grey.</summary>
    public const double PlacementStops = 1.0;

    // Common practice (from memory): a raw file keeps about 2.5–3 stops of highlight above the metered middle grey.
    /// <summary>How far above middle grey the sky may be placed before it saturates, stops.</summary>
    public const double SkyHeadroomStops = 2.5;

    /// <summary>Lowest and highest ISO accepted.</summary>
    public const double MinIso = 25, MaxIso = 409600;

    // Common practice (from memory): the native ISO range of most current cameras, within which the plan moves the ISO
    // on its own; and f/16, past which diffraction softens a telephoto image.
    /// <summary>The ISO range within which the plan changes the ISO to keep the shutter in range.</summary>
    public const double LowestAdjustedIso = 100, HighestAdjustedIso = 25600;

    /// <summary>The f-number up to which the plan closes the aperture when the fastest shutter is too slow.</summary>
    public const double SmallestAdjustedAperture = 16;

    /// <summary>EV at ISO 100 of a luminance (cd/m²): EV₁₀₀ = log₂(L·100/K).</summary>
    public static double Ev100(double luminance) => Math.Log2(luminance * 100 / MeterConstant);

    /// <summary>
    /// The exposure for a luminance with the camera's ISO and aperture (or its fixed shutter), and a bracket. With a sky
    /// luminance, the exposure is capped so the sky stays <see cref="SkyHeadroomStops"/> under saturation. Beyond the
    /// camera's fastest shutter the aperture is closed (to f/16) and the ISO lowered (to 100); beyond the slowest the ISO
    /// is raised (to 25600); only then is the shutter held at the limit, with a warning of how many stops are off.
    /// </summary>
    public static Exposure For(double luminance, Camera camera, int bracketStops, double? skyLuminance = null)
    {
        var warnings = new List<PhotoWarning>();
        var ev = Ev100(luminance) - PlacementStops;
        var n = camera.EffectiveAperture;
        // The exposure H = t·S/N² (S/100 per ISO 100), so t = 100·N²/(S·2^EV).
        var wanted = 100 / Math.Pow(2, ev);
        var h = wanted;
        if (skyLuminance is { } sky && sky > 0)
        {
            // ISO 2720 again: the sky sits log₂(L_sky·H/K) stops above middle grey.
            var most = Math.Pow(2, SkyHeadroomStops) * MeterConstant / sky;
            if (h > most)
            {
                h = most;
                warnings.Add(new PhotoWarning(PhotoWarningCode.SkyLimitsExposure, new Dictionary<string, double>
                {
                    ["wantedSeconds"] = wanted * n * n / camera.Iso, ["cappedSeconds"] = most * n * n / camera.Iso,
                    ["stopsShort"] = Math.Log2(wanted / most), ["skyLuminance"] = sky,
                }));
            }
        }

        double shutter, iso = camera.Iso;
        var (fastest, slowest) = (camera.FastestShutterSeconds, camera.SlowestShutterSeconds);
        if (camera.ShutterSeconds is { } fixedShutter)
        {
            shutter = fixedShutter;
            var needed = h * n * n / shutter;
            iso = Math.Clamp(needed, MinIso, MaxIso);
            if (iso != needed)
                warnings.Add(new PhotoWarning(PhotoWarningCode.IsoOutOfRange, new Dictionary<string, double> { ["isoNeeded"] = needed, ["iso"] = iso }));
        }
        else
        {
            shutter = h * n * n / iso;
            if (shutter < fastest)
            {
                var closed = Math.Min(n * Math.Sqrt(fastest / shutter), Math.Max(n, SmallestAdjustedAperture));
                if (closed > n)
                {
                    warnings.Add(new PhotoWarning(PhotoWarningCode.ApertureClosed, new Dictionary<string, double> { ["fromAperture"] = n, ["toAperture"] = closed }));
                    n = closed;
                }
                shutter = h * n * n / iso;
                if (shutter < fastest) iso = ChangeIso(iso, Math.Max(h * n * n / fastest, Math.Min(iso, LowestAdjustedIso)));
                shutter = h * n * n / iso;
                if (shutter < fastest)
                {
                    warnings.Add(new PhotoWarning(PhotoWarningCode.BeyondFastestShutter, new Dictionary<string, double> { ["fastestSeconds"] = fastest, ["overStops"] = Math.Log2(fastest / shutter) }));
                    shutter = fastest;
                }
            }
            else if (shutter > slowest)
            {
                iso = ChangeIso(iso, Math.Min(h * n * n / slowest, Math.Max(iso, HighestAdjustedIso)));
                shutter = h * n * n / iso;
                if (shutter > slowest)
                {
                    warnings.Add(new PhotoWarning(PhotoWarningCode.BeyondSlowestShutter, new Dictionary<string, double> { ["slowestSeconds"] = slowest, ["underStops"] = Math.Log2(shutter / slowest) }));
                    shutter = slowest;
                }
            }
        }
        var bracket = Enumerable.Range(-bracketStops, 2 * bracketStops + 1)
            .Select(k => Math.Clamp(shutter * Math.Pow(2, k), Math.Min(fastest, shutter), Math.Max(slowest, shutter)))
            .Distinct().ToList();
        return new Exposure(shutter, iso, n, ev, bracket, warnings);

        double ChangeIso(double from, double to)
        {
            if (to != from) warnings.Add(new PhotoWarning(PhotoWarningCode.IsoChanged, new Dictionary<string, double> { ["fromIso"] = from, ["toIso"] = to }));
            return to;
        }
    }
}
