# Writes an INVENTED swing record of any length for the size entries of the hostile corpus:
# a compound pendulum (m = 2 kg, Lc = 0.4 m, J0 = 0.5 kg m^2, viscous b = 0.002 N m s/rad)
# held 1.5 s at 30 degrees, then released; integrated by classical Runge-Kutta with four
# substeps per sample; Gaussian noise of 0.02 degrees (Box-Muller, fixed seed).
#   awk -f make-swing.awk -v seconds=1000 -v rate=1000 > long.csv
BEGIN {
    if (seconds == "") seconds = 1000
    if (rate == "") rate = 1000
    srand(7)
    pi = atan2(0, -1)
    k = 2 * 9.80665 * 0.4 / 0.5
    c = 0.002 / 0.5
    th = 30 * pi / 180
    w = 0
    h = 1 / rate / 4
    n = int(seconds * rate)
    still = int(1.5 * rate)
    print "# INVENTED DEMO DATA for the hostile-input corpus; not a measurement."
    print "time_s,angle_deg"
    for (i = 0; i <= n; i++) {
        if (i > still) {
            for (s = 0; s < 4; s++) {
                k1t = w; k1w = -k * sin(th) - c * w
                k2t = w + h / 2 * k1w; k2w = -k * sin(th + h / 2 * k1t) - c * k2t
                k3t = w + h / 2 * k2w; k3w = -k * sin(th + h / 2 * k2t) - c * k3t
                k4t = w + h * k3w; k4w = -k * sin(th + h * k3t) - c * k4t
                th += h / 6 * (k1t + 2 * k2t + 2 * k3t + k4t)
                w += h / 6 * (k1w + 2 * k2w + 2 * k3w + k4w)
            }
        }
        u = rand(); v = rand()
        noise = 0.02 * sqrt(-2 * log(1 - u)) * cos(2 * pi * v)
        printf "%.6f,%.5f\n", i / rate, th * 180 / pi + noise
    }
}
