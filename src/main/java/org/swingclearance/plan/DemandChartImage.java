package org.swingclearance.plan;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import javax.imageio.ImageIO;

/**
 * Draws the demand line of a plan for the PDF handout, on the server: D of each step against the step number (with
 * its start date), the band limit D = 1 as a dashed line, provisional steps hollow on a dashed line, and the
 * re-screen gate as a vertical dashed line. PNG at twice the printed resolution, grey-scale safe (no meaning in
 * colour alone: shapes and dashes carry it).
 */
final class DemandChartImage {

    /** The words drawn on the chart, already in the reader's language. */
    record Labels(String yAxis, String xAxis, String bandLimit, String gate) {
    }

    private static final int WIDTH = 1600;
    private static final int HEIGHT = 640;
    private static final int LEFT = 120;
    private static final int RIGHT = 40;
    private static final int TOP = 40;
    private static final int BOTTOM = 120;
    private static final Color INK = new Color(0x1f, 0x2a, 0x33);
    private static final Color GRID = new Color(0xd5, 0xdd, 0xe3);
    private static final Color LIMIT = new Color(0x9b, 0x1c, 0x1c);
    private static final Color LINE = new Color(0x2f, 0x5d, 0x7c);
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("MM-dd", Locale.ROOT);

    private DemandChartImage() {
    }

    static byte[] png(List<PlanStepView> steps, Integer gateStep, Labels labels) {
        BufferedImage image = new BufferedImage(WIDTH, HEIGHT, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, WIDTH, HEIGHT);
            draw(g, steps, gateStep, labels);
        } finally {
            g.dispose();
        }
        try (ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            ImageIO.write(image, "png", out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not encode the demand chart", e);
        }
    }

    /** Upper end of the D axis: at least 1.2 so the band limit always shows, rounded up to a tenth. */
    static double yMax(List<PlanStepView> steps) {
        double highest = steps.stream().mapToDouble(PlanStepView::demandRatio).max().orElse(0);
        return Math.max(1.2, Math.ceil(highest * 1.1 * 10) / 10);
    }

    private static void draw(Graphics2D g, List<PlanStepView> steps, Integer gateStep, Labels labels) {
        double yMax = yMax(steps);
        int plotW = WIDTH - LEFT - RIGHT;
        int plotH = HEIGHT - TOP - BOTTOM;
        int n = Math.max(steps.size(), 1);
        Font small = new Font(Font.SANS_SERIF, Font.PLAIN, 22);
        g.setFont(small);
        FontMetrics fm = g.getFontMetrics();

        double tick = yMax > 2.4 ? 0.5 : 0.2;
        for (double y = 0; y <= yMax + 1e-9; y += tick) {
            int py = yPixel(y, yMax, plotH);
            g.setColor(GRID);
            g.setStroke(new BasicStroke(1.5f));
            g.draw(new Line2D.Double(LEFT, py, LEFT + plotW, py));
            g.setColor(INK);
            String label = String.format(Locale.ROOT, "%.1f", y);
            g.drawString(label, LEFT - 12 - fm.stringWidth(label), py + fm.getAscent() / 2 - 2);
        }

        int limitY = yPixel(1.0, yMax, plotH);
        g.setColor(LIMIT);
        g.setStroke(new BasicStroke(3f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {18f, 10f}, 0f));
        g.draw(new Line2D.Double(LEFT, limitY, LEFT + plotW, limitY));
        g.drawString(labels.bandLimit(), LEFT + plotW - fm.stringWidth(labels.bandLimit()) - 8, limitY - 10);

        int every = Math.max(1, (int) Math.ceil(n / 20.0));
        int lastLabelled = Integer.MIN_VALUE;
        g.setColor(INK);
        for (int i = 0; i < steps.size(); i++) {
            // Every k-th step, and the last one when it does not crowd the label before it.
            boolean last = i == steps.size() - 1 && i - lastLabelled >= every;
            if (i % every != 0 && !last) {
                continue;
            }
            lastLabelled = i;
            PlanStepView s = steps.get(i);
            int px = xPixel(i, n, plotW);
            String number = Integer.toString(s.number());
            g.drawString(number, px - fm.stringWidth(number) / 2, TOP + plotH + 30);
            String day = DAY.format(s.startsOn());
            g.drawString(day, px - fm.stringWidth(day) / 2, TOP + plotH + 58);
        }

        if (gateStep != null && gateStep > 1 && gateStep <= steps.size()) {
            int px = (xPixel(gateStep - 2, n, plotW) + xPixel(gateStep - 1, n, plotW)) / 2;
            g.setColor(INK);
            g.setStroke(new BasicStroke(2.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 8f}, 0f));
            g.draw(new Line2D.Double(px, TOP, px, TOP + plotH));
            g.drawString(labels.gate(), px + 8, TOP + fm.getAscent());
        }

        for (int i = 1; i < steps.size(); i++) {
            boolean dashed = steps.get(i).provisional();
            g.setColor(LINE);
            g.setStroke(dashed
                    ? new BasicStroke(4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {14f, 10f}, 0f)
                    : new BasicStroke(4f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
            Path2D segment = new Path2D.Double();
            segment.moveTo(xPixel(i - 1, n, plotW), yPixel(steps.get(i - 1).demandRatio(), yMax, plotH));
            segment.lineTo(xPixel(i, n, plotW), yPixel(steps.get(i).demandRatio(), yMax, plotH));
            g.draw(segment);
        }
        for (int i = 0; i < steps.size(); i++) {
            PlanStepView s = steps.get(i);
            Ellipse2D dot = new Ellipse2D.Double(xPixel(i, n, plotW) - 9, yPixel(s.demandRatio(), yMax, plotH) - 9,
                    18, 18);
            g.setColor(s.provisional() ? Color.WHITE : LINE);
            g.fill(dot);
            g.setColor(LINE);
            g.setStroke(new BasicStroke(3.5f));
            g.draw(dot);
        }

        g.setColor(INK);
        g.setStroke(new BasicStroke(2f));
        g.draw(new Line2D.Double(LEFT, TOP, LEFT, TOP + plotH));
        g.draw(new Line2D.Double(LEFT, TOP + plotH, LEFT + plotW, TOP + plotH));
        g.drawString(labels.xAxis(), LEFT + plotW / 2 - fm.stringWidth(labels.xAxis()) / 2, HEIGHT - 20);
        Graphics2D rotated = (Graphics2D) g.create();
        rotated.rotate(-Math.PI / 2);
        rotated.drawString(labels.yAxis(), -(TOP + plotH / 2) - fm.stringWidth(labels.yAxis()) / 2, 36);
        rotated.dispose();
    }

    private static int xPixel(int index, int count, int plotW) {
        return count == 1 ? LEFT + plotW / 2 : LEFT + 30 + (int) Math.round(index * (plotW - 60.0) / (count - 1));
    }

    private static int yPixel(double d, double yMax, int plotH) {
        return TOP + (int) Math.round(plotH * (1 - d / yMax));
    }
}
