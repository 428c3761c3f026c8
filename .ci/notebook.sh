#!/usr/bin/env bash
# Execute the demo notebook (docs/notebooks/pilot-plant.ipynb) with the Deno Jupyter kernel and nbconvert
# (Debian packages), then check its outputs: HTML tables, a Vega-Lite chart, no error cell.
# Needs the built dist (npm run build) and node_modules (npm ci). Recipe: /work/shared/notes/ci-recipes.md §2.
set -euo pipefail
cd "$(dirname "$0")/.."
start=$(date +%s)
need=(); for p in jupyter-nbconvert jupyter-client; do dpkg -s "$p" >/dev/null 2>&1 || need+=("$p"); done
if ((${#need[@]})); then
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi
[ -x node_modules/.bin/deno ] || npm ci --no-audit --no-fund
[ -f dist/index.js ] || npm run build
# kernelspec inside the repo (a global one would point at another checkout's deno)
export JUPYTER_PATH="$PWD/.jupyter"
mkdir -p .jupyter/kernels/deno .out
printf '{"argv":["%s","jupyter","--kernel","--conn","{connection_file}"],"display_name":"Deno","language":"typescript"}\n' \
  "$PWD/node_modules/.bin/deno" > .jupyter/kernels/deno/kernel.json
nb=docs/notebooks/pilot-plant.ipynb
out=.out/pilot-plant.out.ipynb
# The Deno kernel sometimes publishes an output after reporting idle, and nbclient then drops it:
# the cells display and sleep, and the whole run is retried up to 3 times.
for try in 1 2 3; do
  rm -f "$out"
  jupyter nbconvert --to notebook --execute --ExecutePreprocessor.kernel_name=deno \
    --ExecutePreprocessor.timeout=180 "$nb" --output-dir .out --output pilot-plant.out.ipynb
  if /usr/bin/python3 - "$out" <<'PY'
import json, re, sys
nb = json.load(open(sys.argv[1]))
outs = [o for c in nb["cells"] if c["cell_type"] == "code" for o in c.get("outputs", [])]
errors = [o for o in outs if o.get("output_type") == "error"]
html = ["".join(o["data"]["text/html"]) for o in outs if "text/html" in o.get("data", {})]
# a table whose header cells carry units, e.g. <th ...>T (K)</th>
tables = [h for h in html if '<table class="rxtherm-table">' in h and re.search(r"<th[^>]*>[^<]*\([^)<]+\)</th>", h)]
charts = [o for o in outs if "application/vnd.vegalite.v5+json" in o.get("data", {})]
marks = {o["data"]["application/vnd.vegalite.v5+json"]["mark"]["type"] for o in charts}
print(f"notebook: {len(outs)} outputs, {len(html)} HTML, {len(tables)} tables with units, {len(charts)} charts {sorted(marks)}, {len(errors)} errors")
ok = not errors and len(tables) >= 10 and len(charts) >= 5 and {"line", "bar"} <= marks
sys.exit(0 if ok else 1)
PY
  then
    echo "notebook: passed on try $try in $(( $(date +%s) - start )) s"
    exit 0
  fi
  echo "notebook: outputs incomplete on try $try" >&2
done
echo "notebook: failed after 3 tries" >&2
exit 1
