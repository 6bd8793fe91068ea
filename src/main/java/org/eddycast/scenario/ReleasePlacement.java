package org.eddycast.scenario;

import java.util.ArrayList;
import java.util.List;

/**
 * A release must lie inside the water it is released into. In a tank the forecast takes the cylinder as a box
 * of the same cross-section area (side T sqrt(pi) / 2) and the liquid height, with {@code release.position}
 * measured from one bottom corner; a position outside that box would be moved to its wall and silently change
 * the blend time, so it is refused with the box's size.
 */
public final class ReleasePlacement {

    private ReleasePlacement() {
    }

    /** The side (m) of the square of the same area as a tank's circular cross-section: T sqrt(pi) / 2. */
    public static double equivalentSide(TankDesign tank) {
        return tank.tankDiameter() * Math.sqrt(Math.PI) / 2;
    }

    /** One problem per coordinate of the release that lies outside the water; empty when all is well. */
    public static List<String> problems(Scenario s) {
        List<String> problems = new ArrayList<>();
        if (s.flow() instanceof ChannelFlow c && s.forecast() != null) {
            double w = c.design().width();
            List<Station> stations = s.forecast().stations();
            for (int i = 0; i < stations.size(); i++) {
                double across = stations.get(i).across();
                if (!Double.isNaN(across) && across > w) {
                    problems.add("forecast.stations[" + i + "].across must be between 0 and the surface width "
                            + FieldReader.format(w) + " m (measured from the left water's edge); got "
                            + FieldReader.format(across));
                }
            }
        }
        double[] at = s.release() == null ? null : s.release().position();
        if (at == null || !(s.flow() instanceof TankFlow t)) {
            return problems;
        }
        double side = equivalentSide(t.design());
        double[] size = {side, side, t.design().liquidHeight()};
        String[] axis = {"x", "y", "z"};
        for (int a = 0; a < 3; a++) {
            if (!(at[a] >= 0 && at[a] <= size[a])) {
                problems.add("release.position." + axis[a] + " must be between 0 and " + FieldReader.format(size[a])
                        + " m, inside the " + (a == 2 ? "liquid (flow.liquidHeight)" : "tank (taken as a box of side "
                        + "T sqrt(pi)/2 = " + FieldReader.format(side) + " m, the same cross-section area, measured "
                        + "from one corner)") + "; got " + FieldReader.format(at[a]));
            }
        }
        return problems;
    }
}
