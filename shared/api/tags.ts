// Tags are compared without case, a leading '#' or repeated spaces: "#Torus  Knot" is the tag
// "torus knot". Devices store them in this form, and the feed filter matches in it.

export const normalTag = (t: string): string => t.trim().replace(/^#+/, '').trim().replace(/\s+/g, ' ').toLowerCase();

/** Comma-separated input -> distinct tags in normal form, in the order typed. */
export const tagsFrom = (text: string): string[] => [...new Set(text.split(',').map(normalTag).filter(Boolean))];
