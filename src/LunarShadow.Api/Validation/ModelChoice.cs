using LunarShadow.Astronomy.Shadow;
using LunarShadow.Astronomy.Time;

namespace LunarShadow.Api.Validation;

/// <summary>The computation choices every eclipse endpoint shares: shadow model, layer height, ΔT or its model.</summary>
internal static class ModelChoice
{
    /// <summary>The shadow model and the time scales (defaults where absent), with problems reported on the fields' reader.</summary>
    public static (ShadowModel Model, TimeScaleConverter Time) Read(RequestFields f) => (Shadow(f), new TimeScaleConverter(DeltaT(f)));

    /// <summary>
    /// As <see cref="Read(RequestFields)"/>, also taking shadow=measured: then the model is danjon, the one the eclipse is
    /// first found under, and <c>Measured</c> is true (the caller fits the timings and finds it again).
    /// </summary>
    public static (ShadowModel Model, bool Measured, TimeScaleConverter Time) ReadMeasurable(RequestFields f)
    {
        var name = f.Choice(Parameters.MeasurableShadow)!;
        var measured = name == Parameters.MeasuredShadow;
        return (Shadow(f, measured ? "danjon" : name), measured, new TimeScaleConverter(DeltaT(f)));
    }

    /// <summary>The shadow model; danjon when absent.</summary>
    public static ShadowModel Shadow(RequestFields f) => Shadow(f, f.Choice(Parameters.Shadow)!);

    private static ShadowModel Shadow(RequestFields f, string name)
    {
        var height = f.Number(Parameters.LayerKm)!.Value;
        if (f.Has(Parameters.LayerKm) && name != "layer")
            f.Fail(Parameters.LayerKm, $"{f.FieldName(Parameters.LayerKm)} applies only with shadow=layer.");
        ShadowModel.TryParse(name, Math.Round(height, 1), out var model);
        return model;
    }

    /// <summary>A fixed ΔT or a named model; a problem if both are given.</summary>
    public static IDeltaTModel DeltaT(RequestFields f)
    {
        var fixedSeconds = f.Number(Parameters.DeltaT);
        if (fixedSeconds is not null && f.Has(Parameters.DeltaTModel))
            f.Fail(Parameters.DeltaT, "Give either deltaT (a fixed ΔT) or deltaTModel, not both.");
        var name = f.Choice(Parameters.DeltaTModel)!;
        if (fixedSeconds is { } seconds) return new FixedDeltaT(seconds);
        return DeltaTModelCatalog.TryGet(name, out var model) ? model : DeltaTModelCatalog.Default;
    }
}
