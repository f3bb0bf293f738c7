// The package progress page: follows the rendering without reloading, and reloads once it is done so the
// download link appears. A static file, so the Content-Security-Policy can forbid inline script.
(function () {
  var box = document.getElementById('package-state');
  if (!box) return;
  var url = box.getAttribute('data-poll');
  function poll() {
    fetch(url, {credentials: 'same-origin'}).then(function (r) { return r.json(); }).then(function (s) {
      if (s.finished) { location.reload(); return; }
      document.getElementById('package-done').textContent = s.done;
      document.getElementById('package-total').textContent = s.total;
      var bar = document.getElementById('package-progress'); bar.value = s.done; bar.max = s.total;
      setTimeout(poll, 700);
    }).catch(function () { setTimeout(poll, 2000); });
  }
  setTimeout(poll, 500);
})();
