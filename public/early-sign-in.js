// The plain sign-in form in index.html: shown on /sign-in only, usable before the app's script has run. A press
// of Sign in is held (the app signs in with it as soon as its sign-in page mounts); nothing is sent from here.
;(function () {
  var early = document.getElementById('early-sign-in')
  if (!early) return
  if (location.pathname !== '/sign-in') {
    early.remove()
    return
  }
  var form = early.querySelector('form')
  form.addEventListener('submit', function (event) {
    event.preventDefault()
    form.setAttribute('data-submitted', 'true')
    form.querySelector('button').setAttribute('aria-disabled', 'true')
    form.querySelector('[role=status]').textContent = 'Signing in as soon as the page has loaded…'
  })
  early.hidden = false
  var focused = document.activeElement
  if (!focused || focused === document.body) form.querySelector('input').focus()
  form.setAttribute('data-ready', 'true')
})()
