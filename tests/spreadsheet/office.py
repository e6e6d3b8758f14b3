"""Headless LibreOffice on a throwaway profile: start, install an extension, convert.

Used by calc_headless.py. The extension is added with `unopkg add` into a
profile under the test's work folder; as root (where unopkg refuses a per-user
install) unopkg runs as the unprivileged user nobody.
Every soffice started here is ended here (by its process id).
"""

import os
import shutil
import subprocess
import time
import uuid

import uno

RECALC_ALWAYS = """<?xml version="1.0" encoding="UTF-8"?>
<oor:items xmlns:oor="http://openoffice.org/2001/registry"
           xmlns:xs="http://www.w3.org/2001/XMLSchema"
           xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="ODFRecalcMode" oor:op="fuse"><value>0</value></prop></item>
<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>0</value></prop></item>
</oor:items>
"""


class Office:
    def __init__(self, soffice, profile):
        self.soffice = soffice
        self.profile = os.path.abspath(profile)
        self.url = "file://" + self.profile
        self.proc = None

    def fresh_profile(self):
        shutil.rmtree(self.profile, ignore_errors=True)
        os.makedirs(os.path.join(self.profile, "user"))
        # Recalculate every formula on load: the CSV must hold this build's values.
        with open(os.path.join(self.profile, "user", "registrymodifications.xcu"), "w") as f:
            f.write(RECALC_ALWAYS)

    def _args(self):
        return [self.soffice, f"-env:UserInstallation={self.url}", "--headless", "--invisible",
                "--norestore", "--nologo", "--nodefault", "--nolockcheck"]

    def start(self):
        pipe = "acperf_" + uuid.uuid4().hex
        self.proc = subprocess.Popen(self._args() + [f"--accept=pipe,name={pipe};urp;"],
                                     stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
        local = uno.getComponentContext()
        resolver = local.ServiceManager.createInstanceWithContext(
            "com.sun.star.bridge.UnoUrlResolver", local)
        for _ in range(600):
            try:
                self.ctx = resolver.resolve(f"uno:pipe,name={pipe};urp;StarOffice.ComponentContext")
                return self.ctx
            except Exception:
                if self.proc.poll() is not None:
                    raise RuntimeError("soffice exited before accepting connections")
                time.sleep(0.1)
        raise RuntimeError("soffice did not accept a connection within 60 s")

    def install(self, oxt, unopkg="unopkg"):
        """unopkg add into the throwaway profile. As root, unopkg refuses a
        per-user install, so it runs as the unprivileged user nobody, which then
        owns the profile (root can still use it)."""
        work = os.path.dirname(self.profile)
        local = os.path.join(work, os.path.basename(oxt))
        shutil.copyfile(oxt, local)
        cmd = [unopkg, "add", "--suppress-license", f"-env:UserInstallation={self.url}", local]
        env = dict(os.environ, HOME=work)
        if os.geteuid() == 0:
            for root, dirs, files in os.walk(work):
                for name in [root] + [os.path.join(root, f) for f in dirs + files]:
                    shutil.chown(name, "nobody")
            cmd = ["runuser", "-u", "nobody", "--"] + cmd
        r = subprocess.run(cmd, capture_output=True, text=True, env=env, timeout=180)
        if r.returncode:
            raise RuntimeError(f"unopkg add failed ({r.returncode}): {r.stdout} {r.stderr}")

    def stop(self):
        if self.proc is None:
            return
        try:
            desktop = self.ctx.ServiceManager.createInstanceWithContext(
                "com.sun.star.frame.Desktop", self.ctx)
            desktop.terminate()
        except Exception:
            pass
        try:
            self.proc.wait(timeout=30)
        except subprocess.TimeoutExpired:
            self.proc.kill()
            self.proc.wait()
        self.proc = None

    def convert_csv(self, document, outdir, sheet=None):
        """soffice --headless --convert-to csv (every sheet: -1) into outdir."""
        # CSV filter options: comma, quote ", UTF-8, first line 1, cell format
        # 'as shown' off (full precision), sheet number (-1: all, one file each).
        opts = f"csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,{sheet or -1}"
        r = subprocess.run(self._args() + ["--convert-to", opts, "--outdir", outdir, document],
                           capture_output=True, text=True, timeout=240)
        if r.returncode:
            raise RuntimeError(f"convert failed: {r.stdout} {r.stderr}")
        return r
