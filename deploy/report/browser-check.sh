#!/usr/bin/env bash
# Opens a demo's report.html in headless Chromium (Debian's package) and checks that it renders with its images:
# every <img> decoded (naturalWidth > 0), the inline circuit diagram laid out with a size, and a screenshot of the
# page that is not blank. Builds nothing: CI has built sim-cli/target/branchsim.jar with mvn verify before.
# Prints PASSED or FAILED (exit 1); prints SKIPPED with the reason and exits 0 only when Chromium is missing and
# cannot be installed here (not root, or apt-get fails).
set -uo pipefail
cd "$(dirname "$0")/../.."

skip() { echo "browser-check: SKIPPED: $*"; exit 0; }
fail() { echo "browser-check: FAILED: $*"; exit 1; }

demo=scenarios/fixture-clamp.json
jar=sim-cli/target/branchsim.jar

browser=""
for b in chromium chromium-browser; do
  if command -v "$b" >/dev/null 2>&1; then browser=$(command -v "$b"); break; fi
done
if [ -z "$browser" ]; then
  [ "$(id -u)" = 0 ] || skip "chromium is not installed and installing it needs root (apt-get)"
  command -v apt-get >/dev/null 2>&1 || skip "chromium is not installed and there is no apt-get"
  log=$(mktemp)
  export DEBIAN_FRONTEND=noninteractive
  if ! apt-get install -y -q chromium >"$log" 2>&1; then
    apt-get update -q >>"$log" 2>&1
    apt-get install -y -q chromium >>"$log" 2>&1 || skip "apt-get could not install chromium: $(tail -1 "$log")"
  fi
  rm -f "$log"
  browser=$(command -v chromium) || skip "chromium installed but not on PATH"
fi
[ -f "$jar" ] || fail "$jar is missing: run mvn verify (or package) first"

work=$(mktemp -d)
# KEEP=1 keeps the temporary folder (report, screenshot, browser logs) for a look
trap '[ -n "${KEEP:-}" ] && echo "browser-check: files kept in $work" || rm -rf "$work"' EXIT
java -Djava.awt.headless=true -jar "$jar" run "$demo" --out "$work/run" >"$work/run.log" 2>&1 \
  || fail "the demo run failed: $(tail -3 "$work/run.log")"
report="$work/run/report.html"
[ -s "$report" ] || fail "the run wrote no report.html"
if grep -Eq '(src|href)="(https?:)?//' "$report"; then fail "report.html refers to the network"; fi

# The report needs no script; a copy with a probe appended records what the browser made of it.
probe='<script>window.addEventListener("load",function(){var im=document.images,ok=0,bad=[];'
probe+='for(var i=0;i<im.length;i++){if(im[i].complete&&im[i].naturalWidth>0){ok++;}else{bad.push(im[i].alt);}}'
probe+='var sv=document.querySelectorAll("body > figure > svg, figure svg"),shown=0;'
probe+='for(var j=0;j<sv.length;j++){var r=sv[j].getBoundingClientRect();if(r.width>100&&r.height>100){shown++;}}'
probe+='var d=document.createElement("p");d.id="probe";d.textContent="PROBE images="+im.length+" decoded="+ok'
probe+='+" svg="+sv.length+" svgShown="+shown+" missing="+bad.join(",");document.body.appendChild(d);});</script>'
{ grep -v -x -e "</body>" -e "</html>" "$report"; printf '%s\n</body>\n</html>\n' "$probe"; } >"$work/run/probe.html"

flags=(--headless --no-sandbox --disable-gpu --disable-quic --no-first-run --disable-background-networking
       --disable-component-update --disable-sync)
timeout 180 "$browser" "${flags[@]}" --user-data-dir="$work/profile-1" --virtual-time-budget=10000 \
  --dump-dom "file://$work/run/probe.html" >"$work/dom.html" 2>"$work/chromium-1.log" \
  || fail "chromium could not open the report: $(tail -3 "$work/chromium-1.log")"
line=$(grep -o 'PROBE images=[0-9]* decoded=[0-9]* svg=[0-9]* svgShown=[0-9]* missing=[^<]*' "$work/dom.html")
[ -n "$line" ] || fail "the page did not finish loading (no probe result in the DOM)"
echo "browser-check: $line"
images=$(sed -E 's/.*images=([0-9]+).*/\1/' <<<"$line")
decoded=$(sed -E 's/.*decoded=([0-9]+).*/\1/' <<<"$line")
shown=$(sed -E 's/.*svgShown=([0-9]+).*/\1/' <<<"$line")
[ "$images" -ge 3 ] || fail "only $images images in the report (a run writes at least pressures, flows, positions)"
[ "$decoded" = "$images" ] || fail "$((images - decoded)) of $images images did not decode"
[ "$shown" -ge 1 ] || fail "the circuit diagram (inline SVG) was not laid out"

timeout 180 "$browser" "${flags[@]}" --user-data-dir="$work/profile-2" --virtual-time-budget=10000 \
  --hide-scrollbars --window-size=1200,2400 --screenshot="$work/shot.png" "file://$report" \
  >"$work/chromium-2.log" 2>&1 || fail "chromium could not take a screenshot: $(tail -3 "$work/chromium-2.log")"
[ -s "$work/shot.png" ] || fail "no screenshot"
# share of pixels that are not near white, from the PNG decoded with Java's ImageIO (the JDK the build used)
cat >"$work/Ink.java" <<'JAVA'
public class Ink {
    public static void main(String[] a) throws Exception {
        java.awt.image.BufferedImage img = javax.imageio.ImageIO.read(new java.io.File(a[0]));
        long ink = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                int r = (rgb >> 16) & 255, g = (rgb >> 8) & 255, b = rgb & 255;
                if (r + g + b < 600) {
                    ink++;
                }
            }
        }
        System.out.printf(java.util.Locale.ROOT, "%.4f%n", (double) ink / ((long) img.getWidth() * img.getHeight()));
    }
}
JAVA
ink=$(java -Djava.awt.headless=true "$work/Ink.java" "$work/shot.png") || fail "could not read the screenshot"
echo "browser-check: screenshot 1200x2400, share of inked pixels $ink"
awk -v f="$ink" 'BEGIN { exit !(f > 0.01) }' || fail "the screenshot is blank (inked share $ink <= 0.01)"
echo "browser-check: PASSED: report.html of $demo renders in $("$browser" --version 2>/dev/null | head -1) with $images images and the circuit diagram"
