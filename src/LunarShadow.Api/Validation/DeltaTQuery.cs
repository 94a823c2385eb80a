using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Validation;

/// <summary>The shared <c>deltaT</c> / <c>deltaTModel</c> query pair: a fixed ΔT in seconds, or a named model.</summary>
internal static class DeltaTQuery
{
    /// <summary>Allowed fixed ΔT, seconds: wide enough for the ancient end of the span (about 46,000 s at −1999).</summary>
    public const double MinSeconds = -1000, MaxSeconds = 100_000;

    public const string DeltaTDescription = "Fixed ΔT = TT − UT1 in seconds, from −1000 to 100000; overrides the model. Omit to use deltaTModel.";
    public const string ModelDescription = "ΔT model: best (default: measured values, Stephenson–Morrison–Hohenkerk 2016/2021 outside them) or espenak-meeus-2006 (the Five Millennium Canon's polynomials).";

    /// <summary>Reads the pair; a problem if both are given or either is invalid.</summary>
    public static IDeltaTModel Read(QueryReader reader, string? deltaT, string? deltaTModel)
    {
        var fixedSeconds = reader.Number("deltaT", deltaT, MinSeconds, MaxSeconds, "seconds");
        var name = reader.OneOf("deltaTModel", deltaTModel, DeltaTModelCatalog.Names);
        if (fixedSeconds is not null && name is not null)
            reader.Fail("deltaT", "Give either deltaT (a fixed ΔT) or deltaTModel, not both.");
        if (fixedSeconds is { } seconds) return new FixedDeltaT(seconds);
        return name is not null && DeltaTModelCatalog.TryGet(name, out var model) ? model : DeltaTModelCatalog.Default;
    }
}
