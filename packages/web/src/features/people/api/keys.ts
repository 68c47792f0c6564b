export const peopleKeys = {
  all: ["people"] as const,
  lists: () => [...peopleKeys.all, "list"] as const,
  list: () => [...peopleKeys.lists()] as const,
};
