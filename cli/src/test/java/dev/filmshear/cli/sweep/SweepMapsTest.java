package dev.filmshear.cli.sweep;

import org.junit.jupiter.api.Test;

import java.util.BitSet;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** The pieces of the maps that are ours: number labels and the colour bands. */
class SweepMapsTest {

    static BitSet all(int n) {
        BitSet b = new BitSet();
        b.set(0, n);
        return b;
    }

    @Test
    void labelsAreShortAndExact() {
        assertEquals("60", SweepMaps.format(60));
        assertEquals("15.56", SweepMaps.format(15.5555555556));
        assertEquals("0.0123", SweepMaps.format(0.0123));
        assertEquals("-1e7", SweepMaps.format(-1e7));
        assertEquals("2.5e-5", SweepMaps.format(2.5e-5));
    }

    @Test
    void valuesOverADecadeGetRoundBandsOfEqualRatio() {
        double[] stress = {5504, 7436, 20094, 61000, 99000};
        SweepMaps.Bands bands = SweepMaps.Bands.of(stress, all(stress.length));
        // 1-2-5 would give four bands only, so the finer 1-1.5-2-3-5-7 steps are taken
        assertArrayEquals(new double[] {5000, 7000, 10000, 15000, 20000, 30000, 50000, 70000, 100000},
                bands.edges(), 1e-9);
        assertEquals(0, bands.band(5504));
        assertEquals(4, bands.band(20094));
        assertEquals(7, bands.band(99000));
        double[] wide = {3, 40, 900, 25000};
        assertArrayEquals(new double[] {2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 10000, 20000, 50000},
                SweepMaps.Bands.of(wide, all(wide.length)).edges(), 1e-9);
    }

    @Test
    void valuesWithinADecadeGetRoundLinearBands() {
        double[] temperature = {313.15, 318.2, 334.9};
        SweepMaps.Bands bands = SweepMaps.Bands.of(temperature, all(temperature.length));
        assertArrayEquals(new double[] {310, 315, 320, 325, 330, 335}, bands.edges(), 1e-9);
        assertEquals("330 to 335", bands.label(4));
        double[] constant = {313.15, 313.15};
        assertEquals(1, SweepMaps.Bands.of(constant, all(2)).count());
    }

    @Test
    void failedCasesDoNotWidenTheBands() {
        double[] values = {1, 2, 1e9};
        BitSet ok = all(2);
        assertArrayEquals(new double[] {1, 1.2, 1.4, 1.6, 1.8, 2}, SweepMaps.Bands.of(values, ok).edges(), 1e-12);
    }
}
