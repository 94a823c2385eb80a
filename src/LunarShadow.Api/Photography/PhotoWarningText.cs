using System.Globalization;
using LunarShadow.Api.Common;
using LunarShadow.Api.Formatting;
using LunarShadow.Astronomy.Photography;
using NodaTime;

namespace LunarShadow.Api.Photography;

/// <summary>The one place where the photo plan's warning codes and numbers become English sentences.</summary>
internal static class PhotoWarningText
{
    /// <summary>The warning in one English sentence.</summary>
    public static string Sentence(PhotoWarning w)
    {
        double N(string name) => w[name] ?? 0;
        return w.Code switch
        {
            PhotoWarningCode.MoonBelowHorizon => "The Moon is below the horizon.",
            PhotoWarningCode.LowAltitude => F($"The Moon is {N("altitudeDegrees"):0.#}° up, under 10°: dimmed, reddened and blurred by the air."),
            PhotoWarningCode.Daylight => F($"The Sun is up ({N("sunAltitudeDegrees"):0.#}°): never aim near it."),
            PhotoWarningCode.TwilightSky => F($"Twilight: the Sun is {-N("sunAltitudeDegrees"):0.#}° below the horizon and the sky is about {N("skyLuminance"):0.###} cd/m²; expect low contrast."),
            PhotoWarningCode.SkyLimitsExposure => F($"The bright sky would saturate at the {Shutter(N("wantedSeconds"))} the Moon needs: exposure held to {Shutter(N("cappedSeconds"))} (the Moon {N("stopsShort"):0.#} stops darker than ideal)."),
            PhotoWarningCode.Trailing => F($"Trailing: {Shutter(N("shutterSeconds"))} is {N("excessStops"):0.#} stops over the {Shutter(N("limitSeconds"))} blur limit on this mount. Use a Moon-tracking mount (no limit) or a star-tracking one (limit {Shutter(N("siderealLimitSeconds"))}){TrailingAlternatives(N("shorterFocalLengthMm"), N("isoNeeded"))}, or stack {N("stackFrames"):0} frames of {Shutter(N("limitSeconds"))}."),
            PhotoWarningCode.LeavingFrame => F($"The Moon leaves a fixed frame about {N("minutesInFrame"):0} min after aiming: re-aim now."),
            PhotoWarningCode.ApertureClosed => F($"Too bright for the fastest shutter: aperture closed from f/{N("fromAperture"):0.#} to f/{N("toAperture"):0.#}."),
            PhotoWarningCode.IsoChanged => F($"ISO changed from {N("fromIso"):0} to {N("toIso"):0} to keep the shutter in the camera's range."),
            PhotoWarningCode.BeyondFastestShutter => F($"Even at {Shutter(N("fastestSeconds"))} this over-exposes by {N("overStops"):0.#} stops: use a neutral-density filter or a smaller aperture."),
            PhotoWarningCode.BeyondSlowestShutter => F($"Even at {Shutter(N("slowestSeconds"))} this under-exposes by {N("underStops"):0.#} stops: open the lens if it can, raise the ISO further, or stack frames."),
            PhotoWarningCode.IsoOutOfRange => F($"The shutter given needs ISO {N("isoNeeded"):0}, outside 25–409600; ISO {N("iso"):0} is used."),
            _ => WireNames.Of(w.Code),
        };
    }

    /// <summary>A run note in one English sentence, naming the local clock times of its first and last rows.</summary>
    public static string NoteSentence(PlanNote note, DateTimeZone zone)
    {
        double N(string name) => note.Numbers.TryGetValue(name, out var v) ? v : 0;
        var span = note.Rows == 1
            ? $"At {SiteWording.Clock(note.FromUtc, zone)}"
            : $"From {SiteWording.Clock(note.FromUtc, zone)} to {SiteWording.Clock(note.ToUtc, zone)} ({note.Rows} rows)";
        return note.Code switch
        {
            PhotoWarningCode.IsoChanged => F($"{span}: ISO {(N("lowestIso") > N("fromIso") ? "raised" : "lowered")} from {N("fromIso"):0} to {IsoRange(N("lowestIso"), N("highestIso"))} to keep the shutter in the camera's range."),
            _ => F($"{span}: {WireNames.Of(note.Code)}."),
        };
    }

    private static string IsoRange(double lowest, double highest) =>
        Math.Round(lowest) == Math.Round(highest) ? F($"{lowest:0}") : F($"{lowest:0}–{highest:0}");

    private static string Shutter(double seconds) => seconds >= 1 || seconds <= 0
        ? F($"{seconds:0.#} s")
        : F($"1/{Math.Round(1 / seconds):0} s");

    private static string F(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    // Remedies a photographer can act on: a lens no shorter than 10 mm and an ISO no higher than 25,600 (common practice).
    private static string TrailingAlternatives(double shorterFocalLengthMm, double isoNeeded)
    {
        var lens = shorterFocalLengthMm >= 10 ? F($", or a lens of {shorterFocalLengthMm:0} mm or shorter") : "";
        var iso = isoNeeded is > 0 and <= 25_600 ? F($", or raise the ISO to {isoNeeded:0}") : "";
        return lens + iso;
    }
}
