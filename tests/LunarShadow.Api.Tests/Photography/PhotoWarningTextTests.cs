using LunarShadow.Api.Photography;
using LunarShadow.Astronomy.Photography;

namespace LunarShadow.Api.Tests.Photography;

public class PhotoWarningTextTests
{
    private static PhotoWarning Trailing(double shorterFocalLengthMm, double isoNeeded) => new(PhotoWarningCode.Trailing, new Dictionary<string, double>
    {
        ["shutterSeconds"] = 21.3, ["excessStops"] = 6.4, ["limitSeconds"] = 0.25, ["siderealLimitSeconds"] = 6,
        ["shorterFocalLengthMm"] = shorterFocalLengthMm, ["stackFrames"] = 86, ["isoNeeded"] = isoNeeded,
    });

    // A lens under 10 mm or an ISO over 25,600 is no remedy a photographer can use (common practice): it is not offered.
    [Fact]
    public void Trailing_advice_offers_only_lenses_and_ISO_speeds_a_photographer_can_use()
    {
        var unusable = PhotoWarningText.Sentence(Trailing(4.7, 34_000));
        Assert.DoesNotContain("mm or shorter", unusable, StringComparison.Ordinal);
        Assert.DoesNotContain("raise the ISO", unusable, StringComparison.Ordinal);
        Assert.Contains("stack 86 frames of 1/4 s", unusable, StringComparison.Ordinal);

        var usable = PhotoWarningText.Sentence(Trailing(135, 3200));
        Assert.Contains("a lens of 135 mm or shorter", usable, StringComparison.Ordinal);
        Assert.Contains("raise the ISO to 3200", usable, StringComparison.Ordinal);
    }
}
