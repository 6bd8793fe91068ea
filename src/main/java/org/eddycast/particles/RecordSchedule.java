package org.eddycast.particles;

import java.util.TreeSet;

/**
 * The steps at which the mean-square displacement is recorded: dense early (a geometric sequence, to resolve
 * the ballistic growth before the Lagrangian time scale) and uniform later (for the late-window slope), at
 * most about {@value #TARGET_RECORDS} records whatever the number of steps, so memory does not grow with the
 * run length.
 */
public final class RecordSchedule {

    static final int TARGET_RECORDS = 128;
    private static final int UNIFORM = 80;

    private final int[] steps;

    private RecordSchedule(int[] steps) {
        this.steps = steps;
    }

    /** The schedule for a run of {@code totalSteps} steps. */
    public static RecordSchedule forSteps(int totalSteps) {
        if (totalSteps < 2) {
            throw new IllegalArgumentException("a run needs at least 2 steps; got " + totalSteps);
        }
        TreeSet<Integer> set = new TreeSet<>();
        for (int j = 1; j <= UNIFORM; j++) {
            set.add(Math.max(1, (int) Math.round((double) j * totalSteps / UNIFORM)));
        }
        double ratio = Math.pow(totalSteps, 1.0 / (TARGET_RECORDS - UNIFORM));
        double s = 1;
        while (s <= totalSteps && set.size() < TARGET_RECORDS + 8) {
            set.add((int) Math.round(s));
            s = Math.max(s * ratio, s + 1);
        }
        return new RecordSchedule(set.stream().mapToInt(Integer::intValue).toArray());
    }

    public int size() {
        return steps.length;
    }

    public int step(int record) {
        return steps[record];
    }

    /** Record times for a time step dt. */
    public double[] times(double dt) {
        double[] t = new double[steps.length];
        for (int j = 0; j < t.length; j++) {
            t[j] = steps[j] * dt;
        }
        return t;
    }
}
