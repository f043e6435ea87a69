// The bench PC is shared: after Auth:IdleMinutes without keyboard, pointer or touch input the page signs
// its user out through the top bar's "Switch operator" form. The sign-in cookie's sliding expiry ends idle
// page requests on the server; this also ends a page that stays open on an interactive connection.
(function () {
  const minutes = Number(document.documentElement.dataset.idleMinutes);
  if (!(minutes > 0)) {
    return;
  }
  let timer = 0;
  function signOut() {
    const form = document.querySelector("form.switch-form");
    if (form) {
      form.submit();
    }
  }
  function restart() {
    clearTimeout(timer);
    timer = setTimeout(signOut, minutes * 60 * 1000);
  }
  for (const name of ["keydown", "pointerdown", "touchstart", "wheel"]) {
    document.addEventListener(name, restart, { passive: true, capture: true });
  }
  restart();
})();
