using System;
using System.Linq;
using System.Numerics;
using InductionHazard.Induction;
using Xunit;

namespace InductionHazard.Tests.Induction;

public class PeriodSamplesTests
{
    [Fact]
    public void OnePeriodIsSampledEvenlyFromThePhasorsWhenRead()
    {
        // emf = Im(E e^(j w t)), i = Im(I e^(j w t)): 2 cos(w t) and 3 sin(w t - pi/4) for E = 2j, I = 3 e^(-j pi/4).
        var e = new Complex(0, 2);
        Complex i = Complex.FromPolarCoordinates(3, -Math.PI / 4);
        var samples = new PeriodSamples(e, i, 50, 1.0, 33, 8);
        Assert.Equal(9, samples.Count);
        Assert.Equal(9, samples.ToList().Count); // the enumeration gives as many as the count
        for (int k = 0; k <= 8; k++)
        {
            double t = k / (8 * 50.0), w = 2 * Math.PI * 50;
            Assert.Equal(1.0 + t, samples[k].TimeSeconds, 12);
            Assert.Equal(2 * Math.Cos(w * t), samples[k].EmfVolts, 12);
            Assert.Equal(3 * Math.Sin((w * t) - (Math.PI / 4)), samples[k].CurrentAmperes, 12);
            Assert.Equal(33, samples[k].TemperatureCelsius);
        }

        Assert.Equal(samples[0].EmfVolts, samples[8].EmfVolts, 12);
        Assert.Throws<ArgumentOutOfRangeException>(() => samples[9]);
        Assert.Throws<ArgumentOutOfRangeException>(() => samples[-1]);
    }
}
