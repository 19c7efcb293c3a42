import BakeryDiningOutlined from '@mui/icons-material/BakeryDiningOutlined';
import CalculateOutlined from '@mui/icons-material/CalculateOutlined';
import NotificationsOutlined from '@mui/icons-material/NotificationsOutlined';
import TrendingUpOutlined from '@mui/icons-material/TrendingUpOutlined';
import Card from '@mui/material/Card';
import CardContent from '@mui/material/CardContent';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';

// Promises only what the product brief commits to; no numbers, since there is no data yet.
const PROMISES = [
  {
    icon: TrendingUpOutlined,
    title: 'Know when your starter will peak',
    text: 'Log feedings and rise checks on your Shelf. Peakwise learns how each culture behaves and forecasts its peak, corrected for your kitchen’s temperature, with an honest range.',
  },
  {
    icon: BakeryDiningOutlined,
    title: 'Plan a bake around your day',
    text: 'On the Bench, work back from when the bread should be ready: when to feed, when to mix, and when bulk fermentation will be done — or whether to retard overnight.',
  },
  {
    icon: CalculateOutlined,
    title: 'Get the formula right',
    text: 'Baker’s percentages, hydration counting the starter’s own flour and water, scaling, and the water temperature for your desired dough temperature.',
  },
  {
    icon: NotificationsOutlined,
    title: 'A nudge at the right moment',
    text: 'Alerts remind you to feed, fold, shape or preheat when the forecast says it’s time.',
  },
] as const;

export function WhatPeakwiseDoes() {
  return (
    <Card>
      <CardContent>
        <Typography variant="h2" gutterBottom>
          What Peakwise will do for you
        </Typography>
        <List disablePadding>
          {PROMISES.map(({ icon: Icon, title, text }) => (
            <ListItem key={title} disableGutters alignItems="flex-start">
              <ListItemIcon sx={{ minWidth: 44, mt: 0.5, color: 'secondary.dark' }}>
                <Icon />
              </ListItemIcon>
              <ListItemText primary={title} secondary={text} slotProps={{ primary: { sx: { fontWeight: 500 } } }} />
            </ListItem>
          ))}
        </List>
      </CardContent>
    </Card>
  );
}
