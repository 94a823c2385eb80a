using NodaTime;

namespace LunarShadow.Astronomy.Time;

/// <summary>
/// Converts between UTC, TT and UT1. TT = TAI + 32.184 s exactly. UTC ↔ TAI follows the IERS leap-second
/// table where it applies (1972 to its announced horizon); before 1972, after the horizon, and whenever the
/// caller fixes ΔT, UTC is taken as UT1 = TT − ΔT (|UT1 − UTC| stays below 0.9 s by the definition of UTC).
/// </summary>
public sealed class TimeScaleConverter(IDeltaTModel deltaTModel)
{
    private const double TtMinusTaiSeconds = 32.184;

    /// <summary>A converter with the default ΔT model.</summary>
    public static TimeScaleConverter Default { get; } = new(DeltaTModelCatalog.Default);

    /// <summary>The ΔT model in use.</summary>
    public IDeltaTModel DeltaTModel { get; } = deltaTModel;

    private bool UsesLeapSeconds(Instant utc) => DeltaTModel is not FixedDeltaT && LeapSecondTable.Covers(utc);

    /// <summary>ΔT at an instant of TT.</summary>
    public DeltaT DeltaTAt(TtInstant tt) => DeltaTModel.At(tt.JulianDate.DecimalYear);

    /// <summary>The TT instant of a UTC instant; throws for instants outside the supported years.</summary>
    public TtInstant ToTerrestrialTime(Instant utc)
    {
        var jdUtc = JulianDate.OfUtc(utc);
        SupportedRange.EnsureContains(jdUtc);
        if (UsesLeapSeconds(utc))
            return new TtInstant(jdUtc.PlusSeconds(LeapSecondTable.TaiMinusUtcSeconds(utc) + TtMinusTaiSeconds));
        // UTC taken as UT1: TT = UT1 + ΔT, with ΔT evaluated at TT (one refinement is ample: ΔT changes slowly).
        var tt = jdUtc.PlusSeconds(DeltaTModel.At(jdUtc.DecimalYear).Seconds);
        return new TtInstant(jdUtc.PlusSeconds(DeltaTModel.At(tt.DecimalYear).Seconds));
    }

    /// <summary>The UTC instant of a TT instant (see the class remarks for which UTC that is).</summary>
    public Instant ToUtc(TtInstant tt)
    {
        var ut1 = ToUniversalTime(tt).JulianDate;
        var guess = ut1.ToUtcInstant();
        if (!UsesLeapSeconds(guess)) return guess;
        var utc = tt.JulianDate.PlusSeconds(-TtMinusTaiSeconds - LeapSecondTable.TaiMinusUtcSeconds(guess)).ToUtcInstant();
        return LeapSecondTable.Covers(utc)
            ? tt.JulianDate.PlusSeconds(-TtMinusTaiSeconds - LeapSecondTable.TaiMinusUtcSeconds(utc)).ToUtcInstant()
            : utc;
    }

    /// <summary>The UT1 instant of a TT instant: UT1 = TT − ΔT.</summary>
    public Ut1Instant ToUniversalTime(TtInstant tt) => new(tt.JulianDate.PlusSeconds(-DeltaTAt(tt).Seconds));
}
