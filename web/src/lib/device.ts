const key = 'upstroke.deviceId';

/** A stable id for this tablet, sent with every write so records show which device made them. */
export function deviceId(): string {
  let id = localStorage.getItem(key);
  if (!id) {
    id = crypto.randomUUID();
    localStorage.setItem(key, id);
  }
  return id;
}
