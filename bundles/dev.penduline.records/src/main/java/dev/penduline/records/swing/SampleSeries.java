package dev.penduline.records.swing;

import java.util.Arrays;

/** Growable primitive arrays for a streaming read: times, angles and their source lines. */
final class SampleSeries {

    private double[] times = new double[4096];
    private double[] angles = new double[4096];
    private int[] lines = new int[4096];
    private int size;

    void add(double t, double theta, int line) {
        if (size == times.length) {
            final int grown = size + (size >> 1);
            times = Arrays.copyOf(times, grown);
            angles = Arrays.copyOf(angles, grown);
            lines = Arrays.copyOf(lines, grown);
        }
        times[size] = t;
        angles[size] = theta;
        lines[size] = line;
        size++;
    }

    int size() {
        return size;
    }

    double lastTime() {
        return times[size - 1];
    }

    int lastLine() {
        return lines[size - 1];
    }

    int line(int i) {
        return lines[i];
    }

    double time(int i) {
        return times[i];
    }

    double[] times() {
        return Arrays.copyOf(times, size);
    }

    double[] angles() {
        return Arrays.copyOf(angles, size);
    }
}
