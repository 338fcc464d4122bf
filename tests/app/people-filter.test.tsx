// The Feed's filter by person: the chips wrap instead of running off the screen's edge; past
// the first few names the rest are behind a chip that says how many, and the chosen person
// is always in sight.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { PEOPLE_SHOWN, PeopleFilter } from '@/components/feed/PeopleFilter';

const names = ['Ada Lindqvist', 'Bruno Keller', 'Chiara Conti', 'Dmitri Volkov', 'Emeka Obi', 'Freya Holm', 'Gustav Berg', 'Hana Sato', 'Priyanka Raghunathan'];
const people = names.map((displayName, i) => ({ userId: `u${i}`, displayName }));
const chip = (name: string | RegExp) => screen.queryByRole('button', { name });

test('the chips wrap, the first names show and a chip says how many more there are', () => {
  const onPick = jest.fn();
  render(<PeopleFilter people={people} onPick={onPick} />);
  expect(screen.getByLabelText('Filter by person')).toHaveStyle({ flexWrap: 'wrap' });
  for (const name of names.slice(0, PEOPLE_SHOWN)) expect(chip(name)).toBeOnTheScreen();
  expect(chip('Priyanka Raghunathan')).toBeNull();
  fireEvent.press(chip(`${names.length - PEOPLE_SHOWN} more`)!);
  for (const name of names) expect(chip(name)).toBeOnTheScreen();
  expect(chip(/more$/)).toBeNull();
  fireEvent.press(chip('Priyanka Raghunathan')!);
  expect(onPick).toHaveBeenCalledWith('u8');
  fireEvent.press(chip('Everyone')!);
  expect(onPick).toHaveBeenLastCalledWith(undefined);
});

test('a chosen person past the first few stays in sight with the rest folded', () => {
  render(<PeopleFilter people={people} person="u8" onPick={() => undefined} />);
  expect(chip('Priyanka Raghunathan')).toBeOnTheScreen();
  expect(chip('Hana Sato')).toBeNull();
  expect(chip(`${names.length - PEOPLE_SHOWN - 1} more`)).toBeOnTheScreen();
});

test('a small group shows everyone and no "more" chip', () => {
  render(<PeopleFilter people={people.slice(0, 3)} onPick={() => undefined} />);
  for (const name of names.slice(0, 3)) expect(chip(name)).toBeOnTheScreen();
  expect(chip(/more$/)).toBeNull();
});
